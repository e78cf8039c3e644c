import type { ErrorRequestHandler, RequestHandler } from "express";
import { fieldErrors, fieldMessages, messagesInUnits } from "../../lib/field-errors";
import { hasQuantities } from "../../rules/quantity-text";
import { z } from "zod";

/**
 * Every failed request answers with one shape: { error: { message, fields? } }.
 * `fields` maps a field path ("pourTempC", "defects.0.type") to what is wrong with it.
 */
export class HttpError extends Error {
  /** Per field, in SI words ("above 1,700 °C"). */
  readonly fields?: Record<string, string>;
  /** The messages that quote a limit, as templates ("above {1700 °C}"), for the app to say in a person's units. */
  readonly fieldTemplates?: Record<string, string>;
  constructor(
    readonly status: number,
    message: string,
    fields?: Record<string, string>,
  ) {
    super(message);
    if (!fields) return;
    this.fields = messagesInUnits(fields);
    const templates = Object.entries(fields).filter(([, m]) => hasQuantities(m));
    if (templates.length) this.fieldTemplates = Object.fromEntries(templates);
  }
}

export const notFound = (what = "Not found") => new HttpError(404, what);
export const forbidden = (message: string) => new HttpError(403, message);

export { fieldErrors };

/** Parses with a zod schema or throws a 400 that lists each field's problem. */
export function parseOr400<T extends z.ZodType>(schema: T, data: unknown): z.infer<T> {
  const result = schema.safeParse(data);
  if (!result.success) {
    const fields = fieldMessages(result.error);
    // A problem with the input as a whole ("_", such as an empty melt) is the message itself.
    throw new HttpError(400, fields._ ? messagesInUnits({ _: fields._ })._ : "Some values need fixing.", fields);
  }
  return result.data;
}

export const apiNotFound: RequestHandler = (_req, _res, next) => next(notFound("No such API route"));

/** Connection-level codes: the database is down, restarting or unreachable (not a bad query). */
const UNAVAILABLE_CODES = new Set([
  "ECONNREFUSED",
  "ECONNRESET",
  "ENOTFOUND",
  "ETIMEDOUT",
  "EPIPE",
  "57P01",
  "57P02",
  "57P03",
]);
const UNAVAILABLE_TEXT =
  /timeout exceeded when trying to connect|Connection terminated|Client has encountered a connection error|the database system is (starting up|shutting down)/i;

/** Drizzle wraps the driver's error in `cause`: look down the chain for a lost connection. */
export function isDatabaseUnavailable(err: unknown): boolean {
  for (
    let e = err as { code?: unknown; message?: unknown; cause?: unknown } | undefined, depth = 0;
    e && depth < 5;
    e = e.cause as typeof e, depth++
  ) {
    const code = typeof e.code === "string" ? e.code : "";
    if (UNAVAILABLE_CODES.has(code) || code.startsWith("08")) return true;
    if (typeof e.message === "string" && UNAVAILABLE_TEXT.test(e.message)) return true;
  }
  return false;
}

export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  if (err instanceof HttpError) {
    // A stale edit (server/http/row-version.ts) also answers the row as it now stands.
    const current = (err as { current?: unknown }).current;
    res
      .status(err.status)
      .json({ error: { message: err.message, fields: err.fields, fieldTemplates: err.fieldTemplates, current } });
    return;
  }
  if (isDatabaseUnavailable(err)) {
    res.set("Retry-After", "5");
    res.status(503).json({
      error: { message: "The database is not answering right now; nothing was saved. Try again in a moment." },
    });
    return;
  }
  const body = bodyParserError(err);
  if (body) {
    res.status(body.status).json({ error: { message: body.message } });
    return;
  }
  // Inputs are checked at the edge (lib/fields.ts); a value PostgreSQL still refuses is a gap there,
  // logged so it gets closed, and answered as bad input rather than a crash.
  if (isDataException(err)) {
    console.warn("a value reached PostgreSQL unchecked:", (err as Error).message);
    res.status(400).json({ error: { message: "A value in the request cannot be stored; nothing was changed." } });
    return;
  }
  // Other 4xx errors (a broken %-escape in a route parameter) carry a status of their own.
  const status = typeof err?.status === "number" && err.status >= 400 && err.status < 500 ? err.status : 500;
  if (status === 500) console.error(err);
  const message = status === 500 ? "Something went wrong on the server; nothing was changed." : String(err.message);
  res.status(status).json({ error: { message } });
};

/** body-parser's errors (express.json and friends) in plain words. */
function bodyParserError(err: unknown): { status: number; message: string } | undefined {
  const e = err as { type?: unknown; limit?: unknown };
  if (e?.type === "entity.too.large")
    return { status: 413, message: `The request body is larger than ${Number(e.limit) / 1024} kB; nothing was saved.` };
  if (e?.type === "entity.parse.failed") return { status: 400, message: "The request body is not valid JSON." };
  if (e?.type === "encoding.unsupported" || e?.type === "charset.unsupported")
    return { status: 415, message: "The request body's encoding is not supported; send UTF-8 JSON." };
  return undefined;
}

/** SQLSTATE class 22 (data exception: out of range, bad date, NUL in text) anywhere in the cause chain. */
export function isDataException(err: unknown): boolean {
  for (let e = err as { code?: unknown; cause?: unknown } | undefined, depth = 0; e && depth < 5; depth++) {
    if (typeof e.code === "string" && /^22[0-9A-Z]{3}$/.test(e.code)) return true;
    e = e.cause as typeof e;
  }
  return false;
}
