import { apiBaseUrl } from "./client-env";
import { messagesInUnits } from "./field-errors";
import type { Units } from "./units";

/** A failed API call, with the server's message and, for bad input, a message per field. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields: Record<string, string> = {},
    /** The messages that quote a limit, as templates ("above {1700 °C}"): `fieldsIn` says them in a person's units. */
    readonly fieldTemplates: Record<string, string> = {},
    /** On 412 (an edit from a version someone else has since changed): the row as it now stands. */
    readonly current?: unknown,
  ) {
    super(message);
  }

  /** The field messages with their limits in the person's units. */
  fieldsIn(units: Units): Record<string, string> {
    return { ...this.fields, ...messagesInUnits(this.fieldTemplates, units) };
  }
}

/** `ifMatch` is the row version the person opened (a row's `version`): the save is refused with 412 if it moved on. */
export async function api<T>(
  path: string,
  init: { method?: string; body?: unknown; ifMatch?: number } = {},
): Promise<T> {
  const headers: Record<string, string> = {};
  if (init.body !== undefined) headers["Content-Type"] = "application/json";
  if (init.ifMatch !== undefined) headers["If-Match"] = `"${init.ifMatch}"`;
  let res: Response;
  try {
    res = await fetch(`${apiBaseUrl}/api${path}`, {
      method: init.method ?? "GET",
      credentials: "include",
      headers,
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
    });
  } catch {
    throw new ApiError(0, "The server cannot be reached. Check the connection and try again.");
  }
  const data = await res.json().catch(() => undefined);
  if (!res.ok) {
    throw new ApiError(
      res.status,
      data?.error?.message ?? `The server answered ${res.status}.`,
      data?.error?.fields,
      data?.error?.fieldTemplates,
      data?.error?.current,
    );
  }
  return data as T;
}
