import { ChoiceChips } from "@/components/ui/choice-chips";
import { Notice } from "@/components/ui/notice";
import { useSaveUnits, useUnitsQuery } from "@/hooks/use-units";
import { UNIT_CHOICES, type Units } from "@/lib/units";

/** Each person's own units; saved as soon as a chip is tapped, since there is nothing to undo. */
export function UnitsChooser() {
  const units = useUnitsQuery();
  const save = useSaveUnits();
  if (units.error) return <Notice tone="error">{units.error.message}</Notice>;
  if (!units.data) return null;
  const current = save.variables && save.isPending ? save.variables : units.data;
  const set = (change: Partial<Units>) => save.mutate({ ...current, ...change });

  return (
    <>
      <ChoiceChips
        label="Temperatures"
        options={UNIT_CHOICES.temperature}
        value={current.temperature}
        onChange={(v) => set({ temperature: v as Units["temperature"] })}
      />
      <ChoiceChips
        label="Lengths and thicknesses"
        options={UNIT_CHOICES.length}
        value={current.length}
        onChange={(v) => set({ length: v as Units["length"] })}
      />
      <ChoiceChips
        label="Weights (foam density in kg/m³ or lb/ft³)"
        options={UNIT_CHOICES.mass}
        value={current.mass}
        onChange={(v) => set({ mass: v as Units["mass"] })}
      />
      {save.error ? <Notice tone="error">{save.error.message}</Notice> : null}
    </>
  );
}
