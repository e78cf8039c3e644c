import { onlineManager } from "@tanstack/react-query";
import { useLocalSearchParams, useRouter } from "expo-router";
import { StyleSheet, View } from "react-native";
import { ArchiveControl } from "@/components/archive/archive-control";
import { BackLink } from "@/components/ui/back-link";
import { Button } from "@/components/ui/button";
import { CalcLinks } from "@/components/calculators/calc-links";
import { CastingForm, WAITING } from "@/components/castings/casting-form";
import { WaitingCastings } from "@/components/notebook/waiting-to-send";
import { CastingRow } from "@/components/castings/casting-row";
import { Heading } from "@/components/ui/heading";
import { MeltFacts } from "@/components/melts/melt-facts";
import { MeltYield } from "@/components/melts/melt-yield";
import { Notice } from "@/components/ui/notice";
import { LoadFailed, Loading } from "@/components/ui/query-state";
import { Screen } from "@/components/ui/screen";
import { card, space } from "@/constants/theme";
import { useCreateCasting } from "@/hooks/use-castings";
import { useWaitingSaves } from "@/hooks/use-offline-saves";
import { useMelt } from "@/hooks/use-melts";
import { useUnitsQuery } from "@/hooks/use-units";
import { formatDay } from "@/lib/dates";
import { SI_UNITS } from "@/lib/units";
import { meltYield } from "@/rules/compute/casting-yield";

/** One melt: its conditions, the castings poured from it, and a quick form to add the next casting. */
export default function MeltScreen() {
  const id = Number(useLocalSearchParams<{ id: string }>().id);
  const melt = useMelt(id);
  const units = useUnitsQuery();
  const addCasting = useCreateCasting();
  const waiting = useWaitingSaves("casting").filter((c) => c.meltId === id).length;
  const router = useRouter();
  if (melt.isPending || units.isPending) return <Loading />;
  if (melt.error) return <LoadFailed error={melt.error} />;
  const m = melt.data;
  const u = units.data ?? SI_UNITS;

  return (
    <Screen>
      <BackLink href="/melts" label="All melts" />
      <View style={styles.head}>
        <Heading style={styles.title}>
          {m.alloy} melt, {formatDay(m.pouredOn)}
        </Heading>
        <Button kind="plain" label="Change" onPress={() => router.push(`/melts/${id}/edit`)} />
      </View>
      <ArchiveControl kind="melt" row={m} />
      <MeltFacts melt={m} units={u} />
      <MeltYield melt={m} units={u} />
      {m.notes ? <Notice>{m.notes}</Notice> : null}
      <CalcLinks
        target={{ meltId: id }}
        prefill={{
          alloy: m.alloy,
          process: m.process,
          plannedPourC: m.pourTempC,
          meltTempC: m.meltTempC,
          airTempC: m.ambientTempC,
          humidityPct: m.humidityPct,
          foamDensityKgM3: m.foamDensityKgM3,
          // Metal to melt starts from this melt's own yield, where its castings were weighed.
          yieldPct: roundedYield(meltYield(m.castings).yieldPct),
        }}
      />
      <Heading level={2}>Castings from this melt</Heading>
      {m.castings.length === 0 && !waiting ? <Notice>No castings logged from this melt yet.</Notice> : null}
      {m.castings.map((c) => (
        <CastingRow key={c.id} casting={c} />
      ))}
      <WaitingCastings meltId={id} />
      {/* An archived melt takes no new castings until it is restored. */}
      {m.archivedAt ? null : (
        <View style={styles.add}>
          <Heading level={3}>Add a casting</Heading>
          <CastingForm
            units={u}
            submitLabel="Save casting"
            keepOpen
            isNew
            draftName={`casting:new:${id}`}
            onSubmit={async (input) => {
              // Without a connection the save waits on the device and goes when the connection is back.
              if (onlineManager.isOnline()) return addCasting.mutateAsync({ meltId: id, input });
              addCasting.mutate({ meltId: id, input });
              return WAITING;
            }}
          />
        </View>
      )}
    </Screen>
  );
}

const roundedYield = (y: number | undefined) => (y === undefined ? undefined : Math.round(y));

const styles = StyleSheet.create({
  head: { flexDirection: "row", alignItems: "center", justifyContent: "space-between", gap: space.md },
  title: { flex: 1 },
  add: { ...card, gap: space.md, padding: space.md },
});
