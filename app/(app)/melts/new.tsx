import { onlineManager } from "@tanstack/react-query";
import { useRouter } from "expo-router";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { MeltForm } from "@/components/melts/melt-form";
import { LoadFailed, Loading } from "@/components/ui/query-state";
import { Screen } from "@/components/ui/screen";
import { useCreateMelt, useMeltDefaults } from "@/hooks/use-melts";
import { useUnitsQuery } from "@/hooks/use-units";
import { SI_UNITS } from "@/lib/units";

/**
 * Log a melt: starts from the shop's defaults and the last melt's furnace and alloy. Without a
 * connection the save waits on the device (the melts list shows it) and goes when the connection is back.
 */
export default function NewMeltScreen() {
  const defaults = useMeltDefaults();
  const units = useUnitsQuery();
  const create = useCreateMelt();
  const router = useRouter();
  // The form's text is set once from SI values, so it waits for the person's units.
  if (defaults.isPending || units.isPending) return <Loading />;
  if (defaults.error) return <LoadFailed error={defaults.error} />;

  return (
    <Screen>
      <BackLink href="/melts" label="All melts" />
      <Heading>Log a melt</Heading>
      <MeltForm
        initial={defaults.data}
        units={units.data ?? SI_UNITS}
        submitLabel="Save the melt"
        draftName="melt:new"
        isNew
        onSubmit={async (input) => {
          if (!onlineManager.isOnline()) {
            create.mutate(input);
            // Back to the melts list already under this screen, where the waiting melt shows.
            router.dismissTo("/melts");
            return;
          }
          const melt = await create.mutateAsync(input);
          router.replace(`/melts/${melt.id}`);
        }}
      />
    </Screen>
  );
}
