import { useState } from "react";
import type { z } from "zod";
import { fieldErrors } from "@/lib/field-errors";

/** Runs a zod schema over form values and keeps one message per field for the form to show. */
export function useFormErrors<T extends z.ZodType>(schema: T) {
  const [errors, setErrors] = useState<Record<string, string>>({});
  function check(values: unknown): z.infer<T> | undefined {
    const result = schema.safeParse(values);
    if (result.success) {
      setErrors({});
      return result.data;
    }
    setErrors(fieldErrors(result.error, { topLevel: true }));
    return undefined;
  }
  return { errors, setErrors, check };
}
