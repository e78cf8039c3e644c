import { z } from "zod";
import { groupThousands } from "../rules/quantity-text";

/**
 * The edge of every input: text, ids and dates checked here so that nothing a person types can reach
 * PostgreSQL as a value it refuses (a database error would answer 500 instead of saying what to fix).
 * Shared by the forms and the API; bundled into the web app, so no server imports.
 */

/** PostgreSQL text cannot hold U+0000; a form never types one, so it is refused, not stripped. */
export const NUL = "\u0000";
export const hasNul = (s: string) => s.includes(NUL);
const NO_NUL = "must not contain a NUL character";

/** Longest text a field takes when a schema says nothing else: a page of notes. */
export const TEXT_MAX = 4000;

/** Optional or blank-able text: trimmed, at most `max` characters, no NUL. */
export const text = (max: number = TEXT_MAX, tooLong = `at most ${groupThousands(max)} characters`) =>
  z
    .string({ error: "must be text" })
    .refine((s) => !hasNul(s), NO_NUL)
    .transform((s) => s.trim())
    .pipe(z.string().max(max, tooLong));

/** Text that must be there: `what` says what to write when it is blank. */
export const requiredText = (what: string, max: number, tooLong?: string) =>
  text(max, tooLong).pipe(z.string().min(1, what));

/** PostgreSQL's `integer` (serial ids, counts): 1 to 2,147,483,647. */
export const INT32_MAX = 2_147_483_647;
export const rowId = (message = "must be the id of a row") =>
  z.number({ error: message }).int(message).min(1, message).max(INT32_MAX, message);

/**
 * A calendar date as YYYY-MM-DD that exists (no 31 February) and is within years 1 to 9999:
 * PostgreSQL has no year 0, and a casting log needs no year 10,000.
 */
export const calendarDate = (message = "a date as YYYY-MM-DD") =>
  z.iso.date(message).refine((s) => Number(s.slice(0, 4)) >= 1, "the year must be 1 or later");

/** C0 control bytes and DEL: nothing a person types into a name or an address. */
export const hasControl = (s: string) => [...s].some((ch) => ch.charCodeAt(0) < 0x20 || ch.charCodeAt(0) === 0x7f);

/** A route parameter that names a row by text (shop ids): printable, short, no NUL or control bytes. */
export const textParam = z
  .string()
  .min(1)
  .max(100, "at most 100 characters")
  .refine((s) => !hasControl(s), "must not contain control characters");
