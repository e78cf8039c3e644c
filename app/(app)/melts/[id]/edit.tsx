import { useLocalSearchParams, useRouter, type Href } from "expo-router";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { MeltForm } from "@/components/melts/melt-form";
import { LoadFailed, Loading } from "@/components/ui/query-state";
import { Screen } from "@/components/ui/screen";
import { StaleEditNotice } from "@/components/ui/stale-edit-notice";
import { useFocusField } from "@/hooks/use-focus-field";
import { useMelt, useUpdateMelt } from "@/hooks/use-melts";
import { useStaleEdit } from "@/hooks/use-stale-edit";
import { useUnitsQuery } from "@/hooks/use-units";
import { changedRows, meltConditionRows } from "@/lib/condition-rows";
import { formatDay } from "@/lib/dates";
import { fieldOfFact, isMeltCondition } from "@/lib/fact-fields";
import type { Melt, MeltInput } from "@/lib/notebook-schemas";
import { SI_UNITS, type Units } from "@/lib/units";

/**
 * Correct a melt's conditions; a cleared field is sent as null so the stored value goes too. `field`
 * (a diagnosis input, from "would sharpen the answer") opens the form at that field; `back` returns there.
 */
export default function EditMeltScreen() {
  const params = useLocalSearchParams<{ id: string; field?: string; back?: string }>();
  const id = Number(params.id);
  const melt = useMelt(id);
  const units = useUnitsQuery();
  const update = useUpdateMelt(id);
  const router = useRouter();
  // The version the form opened at (If-Match); taking theirs opens the form again at their version.
  const stale = useStaleEdit<Melt, MeltInput>(update.mutateAsync);
  const { opened, conflict, formKey } = stale;
  if (melt.data && !opened) stale.setOpened(melt.data);
  // Only a casting page of this app: the parameter comes from a link and must not send anyone elsewhere.
  const toCasting = /^\/melts\/\d+\/castings\/\d+$/.test(params.back ?? "");
  const back = (toCasting ? params.back : `/melts/${id}`) as Href;
  useFocusField(params.field ? fieldOfFact(params.field)?.labels : undefined, melt.isSuccess && units.isSuccess);
  if (melt.isPending || units.isPending) return <Loading />;
  if (melt.error) return <LoadFailed error={melt.error} />;
  const unitsNow = units.data ?? SI_UNITS;
  const base = opened ?? melt.data;

  // A refused save keeps what was typed; the notice by the save button offers both versions.
  const done = (saved: boolean) => {
    if (saved) router.replace(back);
  };
  const rows = conflict
    ? changedRows(withNotes({ ...conflict.theirs, ...conflict.mine }, unitsNow), withNotes(conflict.theirs, unitsNow))
    : [];

  return (
    <Screen>
      <BackLink href={back} label={toCasting ? "Back to the casting" : "Back to the melt"} />
      <Heading>Change the melt of {formatDay(melt.data.pouredOn)}</Heading>
      <MeltForm
        key={formKey}
        initial={base}
        units={unitsNow}
        beforeSave={
          conflict ? (
            <StaleEditNotice
              rows={rows}
              busy={update.isPending}
              onKeepMine={() => void stale.keepMine().then(done)}
              onTakeTheirs={stale.takeTheirs}
            />
          ) : null
        }
        submitLabel="Save changes"
        draftName={`melt:${id}`}
        openConditions={!!params.field && isMeltCondition(params.field)}
        onSubmit={(input) => stale.save(input, base.version).then(done)}
      />
    </Screen>
  );
}

/** The melt's conditions in the person's units, and its notes, for comparing two versions. */
function withNotes(melt: Melt, units: Units) {
  return [
    ...meltConditionRows(melt, units),
    { label: "Poured on", value: formatDay(melt.pouredOn) },
    { label: "Notes", value: melt.notes },
  ];
}
