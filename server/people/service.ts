import { eq } from "drizzle-orm";
import { db } from "../db";
import { personUnits } from "../../db/schema";
import { DEFAULT_UNITS, unitsInput, type Units } from "../../lib/notebook-schemas";

/** A person's units follow them across shops; nothing stored means the SI defaults. */
export async function unitsOf(userId: string): Promise<Units> {
  const [row] = await db.select().from(personUnits).where(eq(personUnits.userId, userId));
  if (!row) return DEFAULT_UNITS;
  const parsed = unitsInput.safeParse(row);
  return parsed.success ? parsed.data : DEFAULT_UNITS;
}

export async function saveUnits(userId: string, units: Units): Promise<Units> {
  const values = { ...units, updatedAt: new Date() };
  await db
    .insert(personUnits)
    .values({ userId, ...values })
    .onConflictDoUpdate({ target: personUnits.userId, set: values });
  return units;
}
