import type { z } from "zod";
import { textInUnits } from "./quantity-words";
import { SI_UNITS, type Units } from "./units";

type Issue = Pick<z.core.$ZodIssue, "path" | "message">;
type Options = { topLevel?: boolean };

/**
 * The one mapping from zod's issues to a message per field, used by the server's 400 answers and by
 * every form. Keys are dotted paths as the server names them ("conditions.0.fact"); `topLevel` keys a
 * form's flat fields by the first segment instead. The first issue of a field wins; "_" is the whole input.
 * Messages are templates: a limit is a quantity in braces ("above {1700 °C}", rules/quantity-text.ts).
 */
export function fieldMessages(issues: z.ZodError | readonly Issue[], { topLevel = false }: Options = {}) {
  const list = "issues" in issues ? issues.issues : issues;
  const out: Record<string, string> = {};
  for (const i of list) {
    const key = (topLevel ? (i.path.length ? [i.path[0]] : []) : i.path).map(String).join(".") || "_";
    out[key] ??= i.message;
  }
  return out;
}

/** Field messages with their limits in the person's units (SI when none are given). */
export const messagesInUnits = (messages: Record<string, string>, units: Units = SI_UNITS) =>
  Object.fromEntries(Object.entries(messages).map(([k, m]) => [k, textInUnits(m, units)]));

/** What a form shows: one message per field, its limits in the person's units. */
export function fieldErrors(
  issues: z.ZodError | readonly Issue[],
  { units, ...options }: Options & { units?: Units } = {},
): Record<string, string> {
  return messagesInUnits(fieldMessages(issues, options), units);
}

/**
 * The messages left once a form's field `key` changes from `before` to `after`: that field's own
 * message goes (it was about the old value), as does "_", the message about the form as a whole.
 * For a group of fields kept in one object (a draft's conditions), each changed member's message goes.
 * The rest stay until the next check, so a corrected field stops saying it is wrong at once.
 */
export function messagesAfterChange(errors: Record<string, string>, key: string, before: unknown, after: unknown) {
  const changed = new Set(["_", key]);
  if (isGroup(before) || isGroup(after)) {
    const b = isGroup(before) ? before : {};
    const a = isGroup(after) ? after : {};
    for (const k of new Set([...Object.keys(b), ...Object.keys(a)])) if (b[k] !== a[k]) changed.add(k);
  }
  if (!Object.keys(errors).some((k) => changed.has(k))) return errors;
  return Object.fromEntries(Object.entries(errors).filter(([k]) => !changed.has(k)));
}

const isGroup = (v: unknown): v is Record<string, unknown> => typeof v === "object" && v !== null && !Array.isArray(v);
