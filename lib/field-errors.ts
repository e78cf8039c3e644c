import type { z } from "zod";

type Issue = Pick<z.core.$ZodIssue, "path" | "message">;

/**
 * The one mapping from zod's issues to a message per field, used by the server's 400 answers and by
 * every form. Keys are dotted paths as the server names them ("conditions.0.fact"); `topLevel` keys a
 * form's flat fields by the first segment instead. The first issue of a field wins; "_" is the whole input.
 */
export function fieldErrors(
  issues: z.ZodError | readonly Issue[],
  { topLevel = false }: { topLevel?: boolean } = {},
): Record<string, string> {
  const list = "issues" in issues ? issues.issues : issues;
  const out: Record<string, string> = {};
  for (const i of list) {
    const key = (topLevel ? (i.path.length ? [i.path[0]] : []) : i.path).map(String).join(".") || "_";
    out[key] ??= i.message;
  }
  return out;
}
