import { useMemo, useState } from "react";
import {
  draftToRule,
  ruleDraftInput,
  ruleToDraft,
  SHOP_EXPERIENCE,
  type Comparison,
  type RuleDraft,
} from "@/lib/rulebook-schemas";
import { fieldErrors } from "@/lib/field-errors";
import { siToText, textToSi, unitsFormat } from "@/lib/rule-units";
import type { Units } from "@/lib/units";
import type { DefectLocation, DefectType } from "@/rules/case";
import { factSpec } from "@/rules/fact-catalog";
import type { KbRule } from "@/rules/kb-schema";
import { contradictions } from "@/rules/satisfiable";

/**
 * The rule form's state as typed (text in the person's units), turned into a draft (SI) and
 * checked with the same schema as the server on every change.
 */
export type RowState = {
  key: number;
  fact: string;
  comparison: Comparison | "";
  low: string;
  high: string;
  values: string[];
  yes: boolean | null;
};
export type RuleFormState = {
  defectTypes: DefectType[];
  locations: DefectLocation[];
  rows: RowState[];
  effect: "supports" | "weakens";
  causeKind: "existing" | "new";
  causeId: string;
  newTitle: string;
  newFixes: string;
  weight: number | null;
  because: string;
  shopExperience: boolean;
  otherSources: string;
};

let nextKey = 1;
export const emptyRow = (): RowState => ({
  key: nextKey++,
  fact: "",
  comparison: "",
  low: "",
  high: "",
  values: [],
  yes: null,
});
export const emptyForm = (): RuleFormState => ({
  defectTypes: [],
  locations: [],
  rows: [emptyRow()],
  effect: "supports",
  causeKind: "existing",
  causeId: "",
  newTitle: "",
  newFixes: "",
  weight: null,
  because: "",
  shopExperience: true,
  otherSources: "",
});

const lines = (text: string) =>
  text
    .split("\n")
    .map((l) => l.trim())
    .filter(Boolean);
const numberSpec = (fact: string) => {
  const s = factSpec(fact);
  return s?.kind === "number" ? s : undefined;
};

export function formFromRule(rule: KbRule, u: Units): RuleFormState {
  const d = ruleToDraft(rule);
  return {
    ...emptyForm(),
    defectTypes: d.defectTypes,
    locations: d.locations ?? [],
    effect: d.effect ?? "supports",
    causeKind: "existing",
    causeId: rule.cause,
    weight: d.weight,
    because: d.because,
    shopExperience: d.sources.includes(SHOP_EXPERIENCE),
    otherSources: d.sources.filter((s) => s !== SHOP_EXPERIENCE).join("\n"),
    rows: d.conditions.map((c) => {
      const spec = numberSpec(c.fact);
      const [lo, hi] = Array.isArray(c.value) ? c.value : [c.value];
      return {
        ...emptyRow(),
        fact: c.fact,
        comparison: c.comparison,
        low: spec ? siToText(spec, lo, u) : "",
        high: spec ? siToText(spec, hi, u) : "",
        values: Array.isArray(c.value) && !spec ? (c.value as string[]) : [],
        yes: typeof c.value === "boolean" ? c.value : null,
      };
    }),
  };
}

function rowValue(r: RowState, u: Units): unknown {
  const spec = numberSpec(r.fact);
  const num = (t: string) => (spec ? textToSi(spec, t, u) : undefined);
  switch (r.comparison) {
    case "below":
    case "above":
      return num(r.low);
    case "between":
      return [num(r.low), num(r.high)];
    case "one-of":
    case "not-one-of":
      return r.values;
    case "is":
      return r.yes ?? undefined;
    default:
      return undefined;
  }
}

export function formToDraft(s: RuleFormState, u: Units): RuleDraft {
  return {
    defectTypes: s.defectTypes,
    locations: s.locations,
    effect: s.effect,
    conditions: s.rows.map((r) => ({ fact: r.fact, comparison: r.comparison, value: rowValue(r, u) })),
    cause:
      s.causeKind === "existing"
        ? { kind: "existing", id: s.causeId }
        : { kind: "new", title: s.newTitle, fixes: lines(s.newFixes) },
    weight: s.weight as number,
    because: s.because,
    sources: [...(s.shopExperience ? [SHOP_EXPERIENCE] : []), ...lines(s.otherSources)],
  };
}

/** Field paths as the server names them ("conditions.0.fact", "cause.title"). */
function problems(draft: RuleDraft): Record<string, string> {
  const r = ruleDraftInput.safeParse(draft);
  return r.success ? {} : fieldErrors(r.error);
}

/** Which of the draft's fields a piece of the form feeds. */
const SECTION_OF: Partial<Record<keyof RuleFormState, string>> = {
  rows: "conditions",
  causeKind: "cause",
  causeId: "cause",
  newTitle: "cause",
  newFixes: "cause",
  shopExperience: "sources",
  otherSources: "sources",
};

/** A field's top-level section ("conditions.0.fact" → "conditions"): a message shows once its section was touched. */
const section = (path: string) => path.split(".")[0];

export function useRuleDraft(initial: RuleFormState, units: Units) {
  const [state, setState] = useState(initial);
  const [touched, setTouched] = useState<ReadonlySet<string>>(new Set());
  const [showAll, setShowAll] = useState(false);
  const [serverErrors, setServerErrors] = useState<Record<string, string>>({});
  const draft = useMemo(() => formToDraft(state, units), [state, units]);
  const allErrors = useMemo(() => problems(draft), [draft]);
  const impossible = useMemo(() => {
    const parsed = ruleDraftInput.safeParse(draft);
    return parsed.success
      ? contradictions(draftToRule(parsed.data, "shop-draft", "x").conditions, unitsFormat(units))
      : [];
  }, [draft, units]);
  const errors = Object.fromEntries(
    Object.entries({ ...serverErrors, ...allErrors }).filter(([path]) => showAll || touched.has(section(path))),
  );
  const change = (part: keyof RuleFormState, patch: Partial<RuleFormState>) => {
    setState((s) => ({ ...s, ...patch }));
    setTouched((t) => new Set(t).add(SECTION_OF[part] ?? part));
    setServerErrors({});
  };
  return {
    state,
    draft,
    errors,
    impossible,
    valid: Object.keys(allErrors).length === 0,
    set: <K extends keyof RuleFormState>(key: K, value: RuleFormState[K]) =>
      change(key, { [key]: value } as Partial<RuleFormState>),
    setRow: (key: number, patch: Partial<RowState>) =>
      change("rows", { rows: state.rows.map((r) => (r.key === key ? { ...r, ...patch } : r)) }),
    addRow: () => change("rows", { rows: [...state.rows, emptyRow()] }),
    removeRow: (key: number) => change("rows", { rows: state.rows.filter((r) => r.key !== key) }),
    /** Before saving or trying: show every message, including the server's. */
    reveal: (fromServer: Record<string, string> = {}) => {
      setShowAll(true);
      setServerErrors(fromServer);
    },
  };
}
