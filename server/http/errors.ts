import type { ErrorRequestHandler, RequestHandler } from "express";
import { fieldErrors } from "../../lib/field-errors";
import { z } from "zod";

/**
 * Every failed request answers with one shape: { error: { message, fields? } }.
 * `fields` maps a field path ("pourTempC", "defects.0.type") to what is wrong with it.
 */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
  }
}

export const notFound = (what = "Not found") => new HttpError(404, what);
export const forbidden = (message: string) => new HttpError(403, message);

export { fieldErrors };

/** Parses with a zod schema or throws a 400 that lists each field's problem. */
export function parseOr400<T extends z.ZodType>(schema: T, data: unknown): z.infer<T> {
  const result = schema.safeParse(data);
  if (!result.success) throw new HttpError(400, "Some values need fixing.", fieldErrors(result.error));
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
    res.status(err.status).json({ error: { message: err.message, fields: err.fields } });
    return;
  }
  if (isDatabaseUnavailable(err)) {
    res.set("Retry-After", "5");
    res.status(503).json({
      error: { message: "The database is not answering right now; nothing was saved. Try again in a moment." },
    });
    return;
  }
  // Body parser errors (malformed JSON, too large) carry a status of their own.
  const status = typeof err?.status === "number" && err.status >= 400 && err.status < 500 ? err.status : 500;
  if (status === 500) console.error(err);
  const message = status === 500 ? "Something went wrong on the server; nothing was changed." : String(err.message);
  res.status(status).json({ error: { message } });
};
