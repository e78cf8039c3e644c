import { useState } from "react";
import { useStoredDraft } from "@/hooks/use-stored-draft";
import { messagesAfterChange } from "@/lib/field-errors";
import type { Units } from "@/lib/units";

/**
 * A form's values as typed and the messages about them, kept on the device as they are typed
 * (use-stored-draft.ts). `set` changes one field and drops the messages that were about it, so a
 * corrected field stops saying it is wrong at once, not at the next save; `startOver` goes back to
 * the form as it opened and forgets the stored draft. The melt and casting forms stand on it.
 */
export function useFormDraft<T extends object>(makeStart: () => T, units: Units, form?: string) {
  const [start] = useState(makeStart);
  const [draft, setDraft] = useState(start);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const set = <K extends keyof T>(key: K, value: T[K]) => {
    setErrors((e) => messagesAfterChange(e, String(key), draft[key], value));
    setDraft((d) => ({ ...d, [key]: value }));
  };
  const stored = useStoredDraft(form, units, draft, start, setDraft);
  const startOver = async () => {
    await stored.discard();
    setDraft(start);
    setErrors({});
  };
  return { draft, set, setDraft, errors, setErrors, stored, startOver };
}
