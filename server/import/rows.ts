import { createHash } from "node:crypto";
import { castingInput, meltInput, type CastingInput, type MeltInput } from "../../lib/notebook-schemas";
import { importFieldOf, type ImportField, type ImportMapping } from "../../lib/import-fields";
import { fieldErrors } from "../http/errors";
import { fromField, type Units } from "../../lib/units";

/** One row of the file read through the mapping: the melt and casting it makes, or why it is refused. */
export type ReadRow =
  | { line: number; ok: true; melt: MeltInput; casting: CastingInput; fingerprint: string }
  | { line: number; ok: false; problems: Record<string, string> };

const YES = new Set(["yes", "y", "true", "1", "x"]);
const NO = new Set(["no", "n", "false", "0", ""]);
const words = (s: string) => s.toLowerCase().replace(/[\s_]+/g, "-");

/** A column's unit as the conversion in lib/units.ts reads it (only the part this column's quantity uses). */
const unitsFrom = (unit: string | undefined): Units => ({
  temperature: unit === "F" ? "F" : "C",
  length: unit === "in" ? "in" : "mm",
  mass: unit === "lb" ? "lb" : "kg",
});

/** A cell to the value the input schema checks; a problem is a message in the owner's words. */
function cellValue(f: ImportField, cell: string, unit: string | undefined): { value?: unknown; problem?: string } {
  // A blank required cell goes to the schema as blank, so it says what to write ("name the part").
  if (cell === "") return f.required ? { value: "" } : {};
  switch (f.kind) {
    case "text":
      return { value: cell };
    case "date": {
      // Only the unambiguous form: 03/04/2025 is March in one country and April in another.
      const iso = /^\d{4}-\d{2}-\d{2}/.exec(cell)?.[0];
      return iso ? { value: iso } : { problem: `"${cell}" is not a date as YYYY-MM-DD` };
    }
    case "number": {
      // A measured value is read as the forms read typed text (lib/units.ts fromField), in this column's unit.
      const n = f.quantity ? fromField(f.quantity, cell, unitsFrom(unit)) : Number(cell.replace(",", "."));
      return n !== undefined && Number.isFinite(n) ? { value: n } : { problem: `"${cell}" is not a number` };
    }
    case "yes-no": {
      const w = cell.toLowerCase();
      if (YES.has(w)) return { value: true };
      if (NO.has(w)) return { value: false };
      return { problem: `"${cell}" is not yes or no` };
    }
    case "choice": {
      const w = words(cell);
      const code = Object.entries(f.choices!).find(([c, label]) => c === w || words(label) === w)?.[0];
      return code ? { value: code } : { problem: `"${cell}" is not one of: ${Object.values(f.choices!).join(", ")}` };
    }
  }
}

/** The same facts in the same units make the same fingerprint, whichever columns or units the file used. */
function fingerprintOf(melt: MeltInput, casting: CastingInput) {
  const canonical = (o: Record<string, unknown>) =>
    Object.keys(o)
      .sort()
      .filter((k) => o[k] !== undefined && o[k] !== null)
      .map((k) => [k, typeof o[k] === "number" ? Math.round((o[k] as number) * 1000) / 1000 : o[k]]);
  return createHash("sha256")
    .update(JSON.stringify([canonical(melt), canonical(casting)]))
    .digest("hex");
}

/** Field errors are keyed by the label the owner mapped, so the preview can say "Pour temperature: above 1,700 °C". */
function labelled(errors: Record<string, string>, of: "melt" | "casting", mapping: ImportMapping) {
  const out: Record<string, string> = {};
  for (const [input, message] of Object.entries(errors)) {
    const f = mapping.map((m) => importFieldOf(m.field)!).find((x) => x.of === of && x.input === input);
    out[f?.label ?? input] = message;
  }
  return out;
}

export function readRow(cells: string[], line: number, mapping: ImportMapping): ReadRow {
  const melt: Record<string, unknown> = {};
  const casting: Record<string, unknown> = {};
  const problems: Record<string, string> = {};
  for (const m of mapping) {
    const f = importFieldOf(m.field)!;
    const { value, problem } = cellValue(f, cells[m.column] ?? "", m.unit);
    if (problem) problems[f.label] = problem;
    else if (value !== undefined) (f.of === "melt" ? melt : casting)[f.input] = value;
  }
  // The forms' own schemas (lib/notebook-schemas.ts): the same limits and cross-checks as typing it in.
  const meltRead = meltInput.safeParse(melt);
  const castingRead = castingInput.safeParse(casting);
  // A cell that could not be read keeps its own message over the schema's word on the missing value.
  const schemaSays = {
    ...(meltRead.success ? {} : labelled(fieldErrors(meltRead.error), "melt", mapping)),
    ...(castingRead.success ? {} : labelled(fieldErrors(castingRead.error), "casting", mapping)),
  };
  Object.assign(problems, { ...schemaSays, ...problems });
  if (Object.keys(problems).length || !meltRead.success || !castingRead.success) return { line, ok: false, problems };
  return {
    line,
    ok: true,
    melt: meltRead.data,
    casting: castingRead.data,
    fingerprint: fingerprintOf(meltRead.data, castingRead.data),
  };
}
