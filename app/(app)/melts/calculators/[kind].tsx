import { useLocalSearchParams } from "expo-router";
import { CalculatorForm } from "@/components/calculators/calculator-form";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { Screen } from "@/components/ui/screen";
import { CALCULATOR_TITLES } from "@/lib/calculator-fields";
import { CALCULATORS, type CalculatorKind } from "@/rules/calculators";

/** /melts/calculators/riser?meltId=3&castingId=9&thicknessMm=20: the search params prefill it, in SI. */
export default function CalculatorScreen() {
  const { kind, meltId, castingId, ...prefill } = useLocalSearchParams<Record<string, string>>();
  if (!CALCULATORS.includes(kind as CalculatorKind))
    return (
      <Screen>
        <Notice tone="error">No such calculator.</Notice>
      </Screen>
    );
  const k = kind as CalculatorKind;
  const id = (s?: string) => (s && /^\d+$/.test(s) ? Number(s) : undefined);
  const target = id(castingId) ? { castingId: id(castingId) } : { meltId: id(meltId) };
  const back = id(meltId)
    ? {
        href: id(castingId) ? `/melts/${meltId}/castings/${castingId}` : `/melts/${meltId}`,
        label: id(castingId) ? "Casting" : "Melt",
      }
    : { href: "/melts/calculators", label: "Calculators" };
  return (
    <Screen>
      <BackLink href={back.href as never} label={back.label} />
      <Heading>{CALCULATOR_TITLES[k].title}</Heading>
      <CalculatorForm
        key={k}
        kind={k}
        prefill={prefill}
        target={target}
        targetLabel={id(castingId) ? `casting ${castingId}` : id(meltId) ? `melt ${meltId}` : undefined}
      />
    </Screen>
  );
}
