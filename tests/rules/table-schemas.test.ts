import { getTableColumns, type Table } from "drizzle-orm";
import { doublePrecision, integer, text } from "drizzle-orm/pg-core/columns";
import { pgTable } from "drizzle-orm/pg-core/table";
import { describe, expect, it } from "vitest";
import type { z } from "zod";
import { fixesTried } from "../../db/mentor-schema";
import { alloys, castings, comments, defectMarks, melts, personUnits } from "../../db/notebook-schema";
import {
  alloyInput,
  castingFields,
  commentInput,
  markFields,
  meltFields,
  unitsInput,
} from "../../lib/notebook-schemas";
import { fixInput } from "../../lib/review-schemas";
import { shopSettingsInput } from "../../lib/shop-settings";
import { shopSettings } from "../../db/schema";
import { noticeSettings } from "../../db/people-schema";
import { ruleSwitches } from "../../db/mentor-schema";
import { noticeSettingsInput } from "../../lib/people-schemas";
import { switchInput } from "../../lib/rulebook-schemas";
import { tableInput } from "../../lib/table-schemas";

// The input schemas are built from the tables (lib/table-schemas.ts): these checks fail when a table
// and its schema part ways, whichever of the two was changed.
const shapeOf = (s: z.ZodType): Record<string, z.ZodType> =>
  "shape" in s ? (s as z.ZodObject).shape : shapeOf((s as unknown as { def: { in: z.ZodType } }).def.in);
const SERVER = ["id", "shopId", "createdBy", "createdAt", "updatedAt", "updatedBy", "version"];
const SERVER_TOO = ["archivedAt", "archivedBy", "idempotencyKey"];

const cases: { name: string; table: Table; schema: z.ZodType; fromUrl: string[]; renamed?: [string, string] }[] = [
  { name: "melts", table: melts, schema: meltFields, fromUrl: [], renamed: ["alloyId", "alloy"] },
  // pouredOn is the melt's day, copied onto the casting by a trigger (db/list-schema.ts): no input names it.
  { name: "castings", table: castings, schema: castingFields, fromUrl: ["meltId", "pouredOn"] },
  { name: "defect marks", table: defectMarks, schema: markFields, fromUrl: ["castingId"] },
  { name: "fixes tried", table: fixesTried, schema: fixInput, fromUrl: ["castingId"] },
  { name: "alloys", table: alloys, schema: alloyInput, fromUrl: ["designationKey"] },
  { name: "comments", table: comments, schema: commentInput, fromUrl: ["castingId"] },
  { name: "person units", table: personUnits, schema: unitsInput, fromUrl: ["userId"] },
  { name: "shop settings", table: shopSettings, schema: shopSettingsInput, fromUrl: [] },
  { name: "notice settings", table: noticeSettings, schema: noticeSettingsInput, fromUrl: ["userId"] },
  { name: "rule switches", table: ruleSwitches, schema: switchInput, fromUrl: ["ruleId"] },
];

describe.each(cases)("the $name input schema", ({ table, schema, fromUrl, renamed }) => {
  const columns = getTableColumns(table);
  const shape = shapeOf(schema);
  const personal = Object.keys(columns).filter(
    (k) => ![...SERVER, ...SERVER_TOO, ...fromUrl].includes(k) && k !== renamed?.[0],
  );

  it("has a field for every column a person sets, and none for the server's", () => {
    const expected = [...personal, ...(renamed ? [renamed[1]] : [])].sort();
    expect(Object.keys(shape).sort()).toEqual(expected);
  });

  it("lets a nullable column's field be empty and requires a NOT NULL one", () => {
    for (const key of personal) {
      const empty = shape[key].safeParse(null).success && shape[key].safeParse(undefined).success;
      expect({ key, empty }).toEqual({ key, empty: !columns[key].notNull });
    }
  });

  it("refuses a NUL byte in every text column (PostgreSQL text cannot hold one)", () => {
    for (const key of personal.filter((k) => columns[k].columnType === "PgText")) {
      expect({ key, ok: shape[key].safeParse("cast\u0000iron").success }).toEqual({ key, ok: false });
    }
  });
});

describe("a column added to a table", () => {
  const trial = pgTable("trial", {
    id: integer("id").primaryKey(),
    shopId: text("shop_id").notNull(),
    meltId: integer("melt_id").notNull(),
    label: text("label").notNull(),
    ladleNote: text("ladle_note"),
    ladleCount: integer("ladle_count"),
    tapTempC: doublePrecision("tap_temp_c"),
  });
  const input = tableInput(trial, {}, ["meltId"]);
  const shape = input.shape as Record<string, z.ZodType>;

  it("reaches the schema with no list to update", () => {
    expect(Object.keys(shape).sort()).toEqual(["label", "ladleCount", "ladleNote", "tapTempC"]);
  });

  it("gets the edge checks from its column type when no check is written", () => {
    expect(shape.ladleNote.safeParse("  two ladles  ").data).toBe("two ladles");
    expect(shape.ladleNote.safeParse("a\u0000b").success).toBe(false);
    expect(shape.ladleNote.safeParse("x".repeat(4001)).success).toBe(false);
    // PostgreSQL's integer: 32 bits.
    expect(shape.ladleCount.safeParse(2_147_483_648).success).toBe(false);
    expect(shape.ladleCount.safeParse(1.5).success).toBe(false);
    expect(shape.tapTempC.safeParse(Number.POSITIVE_INFINITY).success).toBe(false);
    expect(shape.label.safeParse(null).success).toBe(false);
    expect(shape.tapTempC.safeParse(null).success).toBe(true);
  });
});
