import { useLocalSearchParams, useRouter, type Href } from "expo-router";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { MeltForm } from "@/components/melts/melt-form";
import { LoadFailed, Loading } from "@/components/ui/query-state";
import { Screen } from "@/components/ui/screen";
import { useFocusField } from "@/hooks/use-focus-field";
import { useMelt, useUpdateMelt } from "@/hooks/use-melts";
import { useUnitsQuery } from "@/hooks/use-units";
import { formatDay } from "@/lib/dates";
import { fieldOfFact, isMeltCondition } from "@/lib/fact-fields";
import { SI_UNITS } from "@/lib/units";

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
  // Only a casting page of this app: the parameter comes from a link and must not send anyone elsewhere.
  const toCasting = /^\/melts\/\d+\/castings\/\d+$/.test(params.back ?? "");
  const back = (toCasting ? params.back : `/melts/${id}`) as Href;
  useFocusField(params.field ? fieldOfFact(params.field)?.labels : undefined, melt.isSuccess && units.isSuccess);
  if (melt.isPending || units.isPending) return <Loading />;
  if (melt.error) return <LoadFailed error={melt.error} />;

  return (
    <Screen>
      <BackLink href={back} label={toCasting ? "Back to the casting" : "Back to the melt"} />
      <Heading>Change the melt of {formatDay(melt.data.pouredOn)}</Heading>
      <MeltForm
        initial={melt.data}
        units={units.data ?? SI_UNITS}
        submitLabel="Save changes"
        draftName={`melt:${id}`}
        openConditions={!!params.field && isMeltCondition(params.field)}
        onSubmit={async (input) => {
          await update.mutateAsync(input);
          router.replace(back);
        }}
      />
    </Screen>
  );
}
