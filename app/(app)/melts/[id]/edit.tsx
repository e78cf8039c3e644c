import { useLocalSearchParams, useRouter } from "expo-router";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { MeltForm } from "@/components/melts/melt-form";
import { LoadFailed, Loading } from "@/components/ui/query-state";
import { Screen } from "@/components/ui/screen";
import { useMelt, useUpdateMelt } from "@/hooks/use-melts";
import { useUnitsQuery } from "@/hooks/use-units";
import { formatDay } from "@/lib/dates";
import { SI_UNITS } from "@/lib/units";

/** Correct a melt's conditions; a cleared field is sent as null so the stored value goes too. */
export default function EditMeltScreen() {
  const id = Number(useLocalSearchParams<{ id: string }>().id);
  const melt = useMelt(id);
  const units = useUnitsQuery();
  const update = useUpdateMelt(id);
  const router = useRouter();
  if (melt.isPending || units.isPending) return <Loading />;
  if (melt.error) return <LoadFailed error={melt.error} />;

  return (
    <Screen>
      <BackLink href={`/melts/${id}`} label="Back to the melt" />
      <Heading>Change the melt of {formatDay(melt.data.pouredOn)}</Heading>
      <MeltForm
        initial={melt.data}
        units={units.data ?? SI_UNITS}
        submitLabel="Save changes"
        draftName={`melt:${id}`}
        onSubmit={async (input) => {
          await update.mutateAsync(input);
          router.replace(`/melts/${id}`);
        }}
      />
    </Screen>
  );
}
