import { useLocalSearchParams, useRouter } from "expo-router";
import { useMemo } from "react";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { LoadFailed, Loading } from "@/components/ui/query-state";
import { RuleForm } from "@/components/rulebook/rule-form";
import { Screen } from "@/components/ui/screen";
import { useMay, useRule, useRulebook } from "@/hooks/use-rulebook";
import { formFromRule } from "@/hooks/use-rule-draft";
import { useUnitsQuery } from "@/hooks/use-units";
import { SI_UNITS } from "@/lib/units";

/** Changing a shop rule saves a new draft version; the published one stays in use until this one is published. */
export default function EditRuleScreen() {
  const ruleId = String(useLocalSearchParams<{ ruleId: string }>().ruleId);
  const rule = useRule(ruleId);
  const book = useRulebook();
  // The form shows values in the person's units: wait for them, or typed values would be read in the wrong ones.
  const unitsQuery = useUnitsQuery();
  const units = unitsQuery.data ?? SI_UNITS;
  const mayWrite = useMay({ rule: ["write"] });
  const router = useRouter();
  const initial = useMemo(() => (rule.data ? formFromRule(rule.data.rule, units) : undefined), [rule.data, units]);
  if (rule.isPending || book.isPending || unitsQuery.isPending) return <Loading />;
  if (rule.error || book.error) return <LoadFailed error={(rule.error ?? book.error)!} />;
  return (
    <Screen>
      <BackLink href={`/rulebook/${ruleId}`} label="The rule" />
      <Heading>Change the rule</Heading>
      {rule.data.source !== "shop" ? (
        <Notice>Built-in rules are not changed here; switch one off and write the shop's own instead.</Notice>
      ) : !mayWrite ? (
        <Notice>Only mentors and owners change rules.</Notice>
      ) : (
        <RuleForm
          key={rule.data.versions[0]?.version}
          initial={initial!}
          ruleId={ruleId}
          causes={book.data.causes}
          units={units}
          onSaved={(r) => router.replace(`/rulebook/${r.id}`)}
        />
      )}
    </Screen>
  );
}
