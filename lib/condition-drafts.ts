import type { ConditionContext, ConditionGroup } from "./condition-fields";
import { formatValue, fromField, toField, type Units } from "./units";

/*
 * The pour conditions as a form holds them and as a page reads them back. Apart from
 * lib/condition-fields.ts (fields and checks), because lib/units.ts reads the notebook schemas,
 * which read the condition checks: one module for both would import itself in a circle.
 */

/** A form's condition values as typed: numbers and text as text, choices by value, yes/no as booleans. */
export type ConditionDraft = Record<string, string | boolean | undefined>;
const fieldsOf = (groups: ConditionGroup[]) => groups.flatMap((g) => g.fields);

/** Stored SI values to what the form shows, in the person's units. */
export function conditionsToDraft(
  groups: ConditionGroup[],
  values: Record<string, unknown>,
  units: Units,
): ConditionDraft {
  const out: ConditionDraft = {};
  for (const f of fieldsOf(groups)) {
    const v = values[f.key];
    if (f.kind === "yes-no") out[f.key] = typeof v === "boolean" ? v : undefined;
    else if (f.kind === "number")
      out[f.key] = typeof v !== "number" ? "" : f.quantity ? toField(f.quantity, v, units) : String(v);
    else out[f.key] = typeof v === "string" ? v : "";
  }
  return out;
}

/**
 * What the form sends: SI numbers, null for what is empty or does not apply here (a field hidden
 * because the process or metal changed is cleared, not kept unseen), and a message for text that is
 * not a number. The values' own checks are the schema's.
 */
export function conditionsFromDraft(
  groups: ConditionGroup[],
  draft: ConditionDraft,
  context: ConditionContext,
  units: Units,
) {
  const values: Record<string, string | number | boolean | null> = {};
  const errors: Record<string, string> = {};
  for (const f of fieldsOf(groups)) {
    const v = draft[f.key];
    values[f.key] = null;
    if (!f.shows(context) || v === undefined) continue;
    if (f.kind === "yes-no") values[f.key] = typeof v === "boolean" ? v : null;
    else if (typeof v !== "string" || v.trim() === "") continue;
    else if (f.kind === "number") {
      const n = f.quantity ? fromField(f.quantity, v, units) : Number(v.trim().replace(",", "."));
      if (n === undefined || Number.isNaN(n)) errors[f.key] = "type a number, or leave it empty";
      else values[f.key] = n;
    } else values[f.key] = v.trim();
  }
  return { values, errors };
}

/** The conditions logged, as label and value for reading back on a melt or casting page. */
export function loggedConditions(groups: ConditionGroup[], values: Record<string, unknown>, units: Units) {
  const rows: { label: string; value: string }[] = [];
  for (const f of fieldsOf(groups)) {
    const v = values[f.key];
    if (v === null || v === undefined || v === "") continue;
    if (f.kind === "yes-no") rows.push({ label: f.label, value: v ? "yes" : "no" });
    else if (f.kind === "choice")
      rows.push({ label: f.label, value: f.options.find((o) => o.value === v)?.label ?? String(v) });
    else if (f.kind === "number" && typeof v === "number")
      rows.push({
        label: f.label,
        value: f.quantity ? formatValue(f.quantity, v, units) : `${v} ${f.unit ?? ""}`.trim(),
      });
    else rows.push({ label: f.label, value: String(v) });
  }
  return rows;
}
