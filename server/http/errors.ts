import type { ErrorRequestHandler, RequestHandler } from "express";
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

export function fieldErrors(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    const key = issue.path.join(".") || "_";
    fields[key] ??= issue.message;
  }
  return fields;
}

/** Parses with a zod schema or throws a 400 that lists each field's problem. */
export function parseOr400<T extends z.ZodType>(schema: T, data: unknown): z.infer<T> {
  const result = schema.safeParse(data);
  if (!result.success) throw new HttpError(400, "Some values need fixing.", fieldErrors(result.error));
  return result.data;
}

export const apiNotFound: RequestHandler = (_req, _res, next) => next(notFound("No such API route"));

export const errorHandler: ErrorRequestHandler = (err, _req, res, _next) => {
  if (err instanceof HttpError) {
    res.status(err.status).json({ error: { message: err.message, fields: err.fields } });
    return;
  }
  // Body parser errors (malformed JSON, too large) carry a status of their own.
  const status = typeof err?.status === "number" && err.status >= 400 && err.status < 500 ? err.status : 500;
  if (status === 500) console.error(err);
  const message = status === 500 ? "Something went wrong on the server; nothing was changed." : String(err.message);
  res.status(status).json({ error: { message } });
};
