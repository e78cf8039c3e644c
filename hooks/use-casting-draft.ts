import { useState } from "react";
import { fieldErrors } from "@/lib/field-errors";
import { numbersToText, textToNumbers, type NumberSpec } from "@/lib/form-numbers";
import { castingInput, type CastingInput, type Outcome } from "@/lib/notebook-schemas";
import type { Units } from "@/lib/units";

export const CASTING_NUMBERS = {
  minSectionMm: "length",
  maxSectionMm: "length",
  sprueHeightMm: "length",
  pourTimeS: null,
} as const satisfies NumberSpec<string>;
type NumberKey = keyof typeof CASTING_NUMBERS;

export type CastingDraft = Record<NumberKey, string> & {
  partName: string;
  pattern: string;
  orientation: string;
  notes: string;
  outcome: Outcome | null;
  hasRiser?: boolean;
  hasOverflow?: boolean;
  hasVents?: boolean;
};
export type CastingInitial = { [K in keyof CastingInput]?: CastingInput[K] | null };

function draftFrom(c: CastingInitial, units: Units): CastingDraft {
  return {
    ...numbersToText(CASTING_NUMBERS, c, units),
    partName: c.partName ?? "",
    pattern: c.pattern ?? "",
    orientation: c.orientation ?? "",
    notes: c.notes ?? "",
    outcome: c.outcome ?? null,
    hasRiser: c.hasRiser ?? undefined,
    hasOverflow: c.hasOverflow ?? undefined,
    hasVents: c.hasVents ?? undefined,
  };
}

/** A casting form's values as typed, in the person's units, checked with the API's schema. */
export function useCastingDraft(initial: CastingInitial, units: Units) {
  const [draft, setDraft] = useState(() => draftFrom(initial, units));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const set = <K extends keyof CastingDraft>(key: K, value: CastingDraft[K]) =>
    setDraft((d) => ({ ...d, [key]: value }));

  function check(): CastingInput | undefined {
    const numbers = textToNumbers(CASTING_NUMBERS, draft, units);
    const input = {
      ...numbers.values,
      partName: draft.partName.trim(),
      pattern: draft.pattern.trim() || null,
      orientation: draft.orientation.trim() || null,
      notes: draft.notes.trim() || null,
      outcome: draft.outcome,
      hasRiser: draft.hasRiser ?? null,
      hasOverflow: draft.hasOverflow ?? null,
      hasVents: draft.hasVents ?? null,
    };
    const parsed = castingInput.safeParse(input);
    const found = {
      ...(parsed.success ? {} : fieldErrors(parsed.error, { topLevel: true, units })),
      ...numbers.errors,
    };
    setErrors(found);
    return parsed.success && Object.keys(found).length === 0 ? parsed.data : undefined;
  }

  /** Ready for the next casting of the same pour: same part and sizes, a fresh outcome and notes. */
  const next = () => setDraft((d) => ({ ...d, outcome: null, notes: "" }));

  return { draft, set, errors, setErrors, check, next };
}
