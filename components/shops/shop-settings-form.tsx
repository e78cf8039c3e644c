import { UNIT_CHOICES } from "@/lib/units";
import { useEffect, useState } from "react";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { useSaveShopSettings } from "@/hooks/use-shop";
import type { Shop } from "@/lib/shop-settings";
import { PROCESS_LABELS } from "@/lib/labels";
import { roleCan } from "@/lib/permissions";
import { BUILT_IN_ALLOYS } from "@/rules/alloys";
import { PROCESSES, type Process } from "@/rules/case";

const ALLOYS = BUILT_IN_ALLOYS.map((a) => ({ value: a.designation, label: a.designation }));
const PROCESS_CHOICES = PROCESSES.map((p) => ({ value: p, label: PROCESS_LABELS[p] }));

/** Defaults a new melt starts from. Owners change them; everyone else sees them. */
export function ShopSettingsForm({ shop }: { shop: Shop }) {
  const mayEdit = roleCan(shop.role, { shop: ["settings"] });
  const [alloy, setAlloy] = useState(shop.defaultAlloy);
  const [process, setProcess] = useState(shop.defaultProcess as Process | null);
  const [temperature, setTemperature] = useState<string | null>(shop.defaultTemperature);
  const [length, setLength] = useState<string | null>(shop.defaultLength);
  const [mass, setMass] = useState<string | null>(shop.defaultMass);
  const save = useSaveShopSettings();
  useEffect(() => {
    setAlloy(shop.defaultAlloy);
    setProcess(shop.defaultProcess as Process | null);
  }, [shop.defaultAlloy, shop.defaultProcess]);

  return (
    <>
      {!mayEdit ? <Notice>Only the shop's owner changes these.</Notice> : null}
      <ChoiceChips label="Default alloy" options={ALLOYS} value={alloy} onChange={setAlloy} disabled={!mayEdit} />
      <ChoiceChips
        label="Default process"
        options={PROCESS_CHOICES}
        value={process}
        onChange={(p) => setProcess(p as Process)}
        disabled={!mayEdit}
      />
      <ChoiceChips
        label="New members start with temperatures in"
        options={UNIT_CHOICES.temperature}
        value={temperature}
        onChange={setTemperature}
        disabled={!mayEdit}
      />
      <ChoiceChips
        label="... lengths in"
        options={UNIT_CHOICES.length}
        value={length}
        onChange={setLength}
        disabled={!mayEdit}
      />
      <ChoiceChips
        label="... weights in"
        options={UNIT_CHOICES.mass}
        value={mass}
        onChange={setMass}
        disabled={!mayEdit}
      />
      {save.error ? <Notice tone="error">{save.error.message}</Notice> : null}
      {save.isSuccess ? <Notice>Saved.</Notice> : null}
      {mayEdit ? (
        <Button
          label="Save defaults"
          busy={save.isPending}
          onPress={() =>
            save.mutate({
              defaultAlloy: alloy,
              defaultProcess: process,
              defaultTemperature: temperature as "C" | "F" | null,
              defaultLength: length as "mm" | "in" | null,
              defaultMass: mass as "kg" | "lb" | null,
            })
          }
        />
      ) : null}
    </>
  );
}
