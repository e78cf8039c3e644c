import type { Answer, ApiRoute, Body, Params } from "./api-routes";
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

type RequestOptions<R extends ApiRoute> = ([keyof Params<R>] extends [never]
  ? { params?: undefined }
  : { params: Params<R> }) &
  ([Body<R>] extends [never] ? { body?: undefined } : { body: Body<R> }) & {
    query?: Record<string, string | number>;
    ifMatch?: number;
  };

/**
 * A call to a route of lib/api-routes.ts, answered with that route's type: `request("GET /melts/:id",
 * { params: { id } })` is a MeltDetail, and the body it sends is checked against the route's too.
 */
export function request<R extends ApiRoute>(route: R, options: RequestOptions<R>): Promise<Answer<R>> {
  const [method, pattern] = route.split(" ") as [string, string];
  const params = (options.params ?? {}) as Record<string, number | string>;
  const path = pattern.replace(/:(\w+)/g, (_, name: string) => encodeURIComponent(String(params[name])));
  const query = options.query
    ? `?${new URLSearchParams(Object.entries(options.query).map(([k, v]) => [k, String(v)]))}`
    : "";
  return send<Answer<R>>(`${path}${query}`, { method, body: options.body, ifMatch: options.ifMatch });
}

/**
 * The fetch behind `request`: the app's JSON calls all name a route of lib/api-routes.ts, so this is
 * not exported (the photo upload, the pour-log import and the PDF and CSV links go by their own ways).
 * `ifMatch` is the row version the person opened (a row's `version`): the save is refused with 412 if it moved on.
 */
async function send<T>(path: string, init: { method?: string; body?: unknown; ifMatch?: number } = {}): Promise<T> {
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
