import { and, desc, eq } from "drizzle-orm";
import { db } from "../db";
import { calculations, castings, melts, user } from "../../db/schema";
import { calculatorInputSchemas, type SavedCalculation } from "../../lib/calculator-schemas";
import {
  CalcInputError,
  needsAlloy,
  runCalculator,
  type CalcAlloy,
  type CalculatorInputs,
  type CalculatorKind,
} from "../../rules/calculators";
import type { AlloyFamily } from "../../rules/fact-catalog";
import type { ShopMember } from "../auth/shop-access";
import { HttpError, notFound, parseOr400 } from "../http/errors";
import { requireAlloy } from "../alloys/service";

/** The melt a result belongs to: the melt itself, or the casting's melt. Another shop's is not found. */
async function ownerOf(shopId: string, target: { meltId?: number; castingId?: number }) {
  if (target.castingId !== undefined) {
    const [c] = await db
      .select({ meltId: castings.meltId })
      .from(castings)
      .where(and(eq(castings.shopId, shopId), eq(castings.id, target.castingId)));
    if (!c) throw notFound("No such casting");
    return { meltId: c.meltId, castingId: target.castingId };
  }
  const [m] = await db
    .select({ id: melts.id })
    .from(melts)
    .where(and(eq(melts.shopId, shopId), eq(melts.id, target.meltId ?? 0)));
  if (!m) throw notFound("No such melt");
  return { meltId: m.id, castingId: null };
}

/** Works the result out again on the server from the same rules, so what is kept is what the rules say. */
export async function workOut<K extends CalculatorKind>(shopId: string, kind: K, raw: unknown) {
  const input = parseOr400(calculatorInputSchemas[kind], raw) as CalculatorInputs[K];
  let alloy: CalcAlloy | undefined;
  if (needsAlloy(kind)) {
    const row = await requireAlloy(shopId, (input as { alloy: string }).alloy);
    alloy = { ...row, family: row.family as AlloyFamily };
  }
  try {
    return { input, result: runCalculator(kind, input, alloy) };
  } catch (e) {
    if (e instanceof CalcInputError) throw new HttpError(400, "Some values need fixing.", { [e.field]: e.message });
    throw e;
  }
}

export async function saveCalculation(
  m: ShopMember,
  save: { kind: CalculatorKind; meltId?: number; castingId?: number; input: unknown },
): Promise<SavedCalculation> {
  const target = await ownerOf(m.shopId, save);
  const { input, result } = await workOut(m.shopId, save.kind, save.input);
  const [row] = await db
    .insert(calculations)
    .values({ shopId: m.shopId, ...target, kind: save.kind, input, result, createdBy: m.userId })
    .returning();
  return toSaved(row, m.userName);
}

export async function listCalculations(shopId: string, q: { meltId?: number; castingId?: number }) {
  const where =
    q.castingId !== undefined
      ? and(eq(calculations.shopId, shopId), eq(calculations.castingId, q.castingId))
      : and(eq(calculations.shopId, shopId), eq(calculations.meltId, q.meltId ?? 0));
  const rows = await db
    .select({ c: calculations, name: user.name })
    .from(calculations)
    .innerJoin(user, eq(user.id, calculations.createdBy))
    .where(where)
    .orderBy(desc(calculations.createdAt), desc(calculations.id));
  return rows.map((r) => toSaved(r.c, r.name));
}

function toSaved(row: typeof calculations.$inferSelect, name: string): SavedCalculation {
  return {
    id: row.id,
    kind: row.kind as CalculatorKind,
    meltId: row.meltId,
    castingId: row.castingId,
    input: row.input,
    result: row.result,
    createdBy: { id: row.createdBy, name },
    createdAt: row.createdAt.toISOString(),
  };
}
