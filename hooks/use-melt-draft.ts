import { useFormDraft } from "@/hooks/use-form-draft";
import { localDay } from "@/lib/dates";
import { fieldErrors, messagesInUnits } from "@/lib/field-errors";
import { numbersToText, textToNumbers, type NumberSpec } from "@/lib/form-numbers";
import { MELT_CONDITIONS, type ConditionContext } from "@/lib/condition-fields";
import { conditionsFromDraft, conditionsToDraft, type ConditionDraft } from "@/lib/condition-drafts";
import { alloyConflicts, meltInput, type Alloy, type MeltInput } from "@/lib/notebook-schemas";
import { metalOf } from "@/rules/alloys";
import type { Units } from "@/lib/units";
import type { Charge, DegassingMethod, Process } from "@/rules/case";

/** The melt's number fields and how each converts to the person's units. */
export const MELT_NUMBERS = {
  meltTempC: "temperature",
  pourTempC: "temperature",
  degasMinutes: null,
  ambientTempC: "temperature",
  humidityPct: null,
  sandMoisturePct: null,
  coatingCoats: null,
  foamDensityKgM3: "density",
  chargeWeightKg: "mass",
} as const satisfies NumberSpec<string>;
type NumberKey = keyof typeof MELT_NUMBERS;

export type MeltDraft = Record<NumberKey, string> & {
  pouredOn: string;
  alloy: string;
  process: Process | null;
  charge: Charge | null;
  furnace: string;
  degassing: DegassingMethod | null;
  fluxed?: boolean;
  skimmed?: boolean;
  coatingApplied?: boolean;
  coatingDried?: boolean;
  /** Melt treatment, sand, mould and foam beyond the everyday fields (lib/condition-fields.ts). */
  conditions: ConditionDraft;
  notes: string;
  /** The idempotency key of this new melt's save, made when it is first saved and kept with the draft. */
  saveId?: string;
};

type Initial = { [K in keyof MeltInput]?: MeltInput[K] | null };
const orUndefined = <T>(v: T | null | undefined) => v ?? undefined;

/** Which fields a process has: foam density only for lost foam; no mould moisture in a metal mould. */
export const showsFoam = (p: Process | null) => p === "lost-foam";
export const showsMoisture = (p: Process | null) => p !== "permanent-mould";

function draftFrom(m: Initial, units: Units): MeltDraft {
  return {
    ...numbersToText(MELT_NUMBERS, m, units),
    pouredOn: m.pouredOn ?? localDay(),
    alloy: m.alloy ?? "",
    process: m.process ?? null,
    charge: m.charge ?? null,
    furnace: m.furnace ?? "",
    degassing: m.degassing ?? null,
    fluxed: orUndefined(m.fluxed),
    skimmed: orUndefined(m.skimmed),
    coatingApplied: orUndefined(m.coatingApplied),
    coatingDried: orUndefined(m.coatingDried),
    conditions: conditionsToDraft(MELT_CONDITIONS, m, units),
    notes: m.notes ?? "",
  };
}

/** Which conditions apply: the process chosen and the metal of the alloy chosen. */
export function meltContext(draft: MeltDraft, alloys: Alloy[]): ConditionContext {
  const alloy = alloys.find((a) => a.designation === draft.alloy);
  return { process: draft.process, metal: alloy ? metalOf(alloy.family) : undefined };
}

/**
 * A melt form's values as typed (numbers in the person's units), and their check: the shared zod
 * schema, the alloy's solidus, and plain messages for what zod would word for programmers.
 */
export function useMeltDraft(initial: Initial, units: Units, form?: string) {
  const { draft, set, errors, setErrors, stored, startOver } = useFormDraft(
    () => draftFrom(initial, units),
    units,
    form,
  );

  /** The input to send, or undefined; `errors` also carries "_", a message about the melt as a whole. */
  function check(alloys: Alloy[], saveId?: string): { input?: MeltInput; errors: Record<string, string> } {
    const numbers = textToNumbers(MELT_NUMBERS, draft, units);
    const conditions = conditionsFromDraft(MELT_CONDITIONS, draft.conditions, meltContext(draft, alloys), units);
    const v = numbers.values;
    const input = {
      ...v,
      ...conditions.values,
      sandMoisturePct: showsMoisture(draft.process) ? v.sandMoisturePct : null,
      foamDensityKgM3: showsFoam(draft.process) ? v.foamDensityKgM3 : null,
      // Hidden fields send nothing: minutes without degassing, coats of a coating that was not applied.
      degasMinutes: draft.degassing && draft.degassing !== "none" ? v.degasMinutes : null,
      coatingCoats: draft.coatingApplied === false ? null : v.coatingCoats,
      pouredOn: draft.pouredOn.trim(),
      alloy: draft.alloy,
      process: draft.process,
      charge: draft.charge,
      furnace: draft.furnace.trim() || null,
      degassing: draft.degassing,
      fluxed: draft.fluxed ?? null,
      skimmed: draft.skimmed ?? null,
      coatingApplied: draft.coatingApplied ?? null,
      coatingDried: draft.coatingApplied === false ? null : (draft.coatingDried ?? null),
      notes: draft.notes.trim() || null,
      ...(saveId ? { idempotencyKey: saveId } : {}),
    };
    const parsed = meltInput.safeParse(input);
    const alloy = alloys.find((a) => a.designation === draft.alloy);
    const found = {
      ...(parsed.success ? {} : fieldErrors(parsed.error, { topLevel: true, units })),
      ...(alloy ? messagesInUnits(alloyConflicts(input as Initial as MeltInput, alloy), units) : {}),
      ...numbers.errors,
      ...conditions.errors,
      ...(draft.process ? {} : { process: "choose a process" }),
      ...(draft.alloy ? {} : { alloy: "choose an alloy" }),
    };
    setErrors(found);
    return { input: parsed.success && Object.keys(found).length === 0 ? parsed.data : undefined, errors: found };
  }

  return { draft, set, errors, setErrors, check, restored: stored.restored, discard: stored.discard, startOver };
}
