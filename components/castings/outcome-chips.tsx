import { ChoiceChips } from "@/components/ui/choice-chips";
import { OUTCOME_LABELS } from "@/lib/labels";
import type { Outcome } from "@/lib/notebook-schemas";

const OPTIONS = (Object.keys(OUTCOME_LABELS) as Outcome[]).map((o) => ({ value: o, label: OUTCOME_LABELS[o] }));

type Props = { value: Outcome | null; onChange: (o: Outcome) => void; label?: string; disabled?: boolean };

export function OutcomeChips({ value, onChange, label = "How it came out", disabled }: Props) {
  return (
    <ChoiceChips
      label={label}
      options={OPTIONS}
      value={value}
      onChange={(v) => onChange(v as Outcome)}
      disabled={disabled}
    />
  );
}
