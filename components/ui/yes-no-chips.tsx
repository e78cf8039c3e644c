import { ChoiceChips } from "@/components/ui/choice-chips";

const OPTIONS = [
  { value: "yes", label: "yes" },
  { value: "no", label: "no" },
  { value: "unknown", label: "not noted" },
];

/**
 * A yes/no that can also stay unknown: "not noted" is not the same as "no" for the diagnosis,
 * which never guesses a missing input.
 */
export function YesNoChips({
  label,
  value,
  onChange,
}: {
  label: string;
  value: boolean | undefined;
  onChange: (v: boolean | undefined) => void;
}) {
  const current = value === undefined ? "unknown" : value ? "yes" : "no";
  return (
    <ChoiceChips
      label={label}
      options={OPTIONS}
      value={current}
      onChange={(v) => onChange(v === "unknown" ? undefined : v === "yes")}
    />
  );
}
