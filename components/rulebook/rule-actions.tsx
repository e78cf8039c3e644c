import { useRouter } from "expo-router";
import { StyleSheet, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { RuleTrial } from "@/components/rulebook/rule-trial";
import { space } from "@/constants/theme";
import { useMay, usePublishRule, useRetireRule, useSwitchRule, useTryRule } from "@/hooks/use-rulebook";
import { ApiError } from "@/lib/api";
import { ruleToDraft, type RuleDetail } from "@/lib/rulebook-schemas";

/** What a mentor can do with a rule: change, try, publish or retire a shop rule; switch a built-in one off or on. */
export function RuleActions({ rule }: { rule: RuleDetail }) {
  const router = useRouter();
  const may = {
    write: useMay({ rule: ["write"] }),
    publish: useMay({ rule: ["publish"] }),
    retire: useMay({ rule: ["retire"] }),
  };
  const publish = usePublishRule(rule.id);
  const retire = useRetireRule(rule.id);
  const toggle = useSwitchRule(rule.id);
  const trial = useTryRule();
  const error = publish.error ?? retire.error ?? toggle.error ?? trial.error;
  const shop = rule.source === "shop";
  if (!may.write && !may.publish && !may.retire) return null;
  return (
    <View style={styles.wrap}>
      <View style={styles.row}>
        {shop && may.write ? (
          <Button kind="plain" label="Change" onPress={() => router.push(`/rulebook/${rule.id}/edit`)} />
        ) : null}
        {shop && may.write && rule.status !== "retired" ? (
          <Button
            kind="plain"
            label="Try on past cases"
            busy={trial.isPending}
            testID="try-saved-rule"
            onPress={() => trial.mutate({ draft: ruleToDraft(rule.rule), ruleId: rule.id })}
          />
        ) : null}
        {shop && may.publish && rule.status !== "published" ? (
          <Button
            label={rule.status === "retired" ? "Publish again" : "Publish"}
            busy={publish.isPending}
            onPress={() => publish.mutate(undefined)}
            testID="publish-rule"
          />
        ) : null}
        {shop && may.retire && rule.status !== "retired" ? (
          <Button
            kind="plain"
            label="Retire"
            busy={retire.isPending}
            onPress={() => retire.mutate(undefined)}
            testID="retire-rule"
          />
        ) : null}
        {!shop && may.retire ? (
          <Button
            kind="plain"
            label={rule.switchedOff ? "Switch back on here" : "Switch off for this shop"}
            busy={toggle.isPending}
            onPress={() => toggle.mutate(!rule.switchedOff)}
            testID="switch-rule"
          />
        ) : null}
      </View>
      {error ? (
        <Notice tone="error">
          {error instanceof ApiError ? (error.fields.conditions ?? error.message) : error.message}
        </Notice>
      ) : null}
      {trial.data ? <RuleTrial trial={trial.data} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: space.md },
  row: { flexDirection: "row", flexWrap: "wrap", gap: space.sm },
});
