import { useState } from "react";
import type { z } from "zod";

/** Runs a zod schema over form values and keeps one message per field for the form to show. */
export function useFormErrors<T extends z.ZodType>(schema: T) {
  const [errors, setErrors] = useState<Record<string, string>>({});
  function check(values: unknown): z.infer<T> | undefined {
    const result = schema.safeParse(values);
    if (result.success) {
      setErrors({});
      return result.data;
    }
    const next: Record<string, string> = {};
    for (const issue of result.error.issues) next[String(issue.path[0] ?? "_")] ??= issue.message;
    setErrors(next);
    return undefined;
  }
  return { errors, setErrors, check };
}
