import { useFormDraft } from "@/hooks/use-form-draft";
import { fieldErrors } from "@/lib/field-errors";
import { numbersToText, textToNumbers, type NumberSpec } from "@/lib/form-numbers";
import { CASTING_CONDITIONS } from "@/lib/condition-fields";
import { conditionsFromDraft, conditionsToDraft, type ConditionDraft } from "@/lib/condition-drafts";
import { castingInput, type CastingInput, type Outcome } from "@/lib/notebook-schemas";
import type { Units } from "@/lib/units";

export const CASTING_NUMBERS = {
  minSectionMm: "length",
  maxSectionMm: "length",
  sprueHeightMm: "length",
  pourTimeS: null,
  castingWeightKg: "mass",
  pouredWeightKg: "mass",
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
  /** The gating beyond the sprue height (lib/condition-fields.ts). */
  conditions: ConditionDraft;
  /** The idempotency key of this new casting's save, made when it is first saved. */
  saveId?: string;
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
    conditions: conditionsToDraft(CASTING_CONDITIONS, c, units),
  };
}

/** A casting form's values as typed, in the person's units, checked with the API's schema. */
export function useCastingDraft(initial: CastingInitial, units: Units, form?: string) {
  const { draft, set, setDraft, errors, setErrors, stored, startOver } = useFormDraft(
    () => draftFrom(initial, units),
    units,
    form,
  );

  function check(saveId?: string): CastingInput | undefined {
    const numbers = textToNumbers(CASTING_NUMBERS, draft, units);
    // The gating applies to every process (lost foam too: its rules read the gating but not the free fall).
    const conditions = conditionsFromDraft(CASTING_CONDITIONS, draft.conditions, { process: null }, units);
    const input = {
      ...numbers.values,
      ...conditions.values,
      partName: draft.partName.trim(),
      pattern: draft.pattern.trim() || null,
      orientation: draft.orientation.trim() || null,
      notes: draft.notes.trim() || null,
      outcome: draft.outcome,
      hasRiser: draft.hasRiser ?? null,
      hasOverflow: draft.hasOverflow ?? null,
      hasVents: draft.hasVents ?? null,
      ...(saveId ? { idempotencyKey: saveId } : {}),
    };
    const parsed = castingInput.safeParse(input);
    const found = {
      ...(parsed.success ? {} : fieldErrors(parsed.error, { topLevel: true, units })),
      ...numbers.errors,
      ...conditions.errors,
    };
    setErrors(found);
    return parsed.success && Object.keys(found).length === 0 ? parsed.data : undefined;
  }

  /** Ready for the next casting of the same pour: same part and sizes, a fresh outcome, notes and save. */
  const next = () => setDraft((d) => ({ ...d, outcome: null, notes: "", saveId: undefined }));

  return { draft, set, errors, setErrors, check, next, restored: stored.restored, discard: stored.discard, startOver };
}
