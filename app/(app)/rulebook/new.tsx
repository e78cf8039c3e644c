import { useRouter } from "expo-router";
import { useState } from "react";
import { BackLink } from "@/components/back-link";
import { Heading } from "@/components/heading";
import { Notice } from "@/components/notice";
import { LoadFailed, Loading } from "@/components/query-state";
import { RuleForm } from "@/components/rule-form";
import { Screen } from "@/components/screen";
import { useMay, useRulebook } from "@/hooks/use-rulebook";
import { emptyForm } from "@/hooks/use-rule-draft";
import { useUnits } from "@/hooks/use-units";

/** A new rule, written as a draft; it is published from its own page once tried. */
export default function NewRuleScreen() {
  const book = useRulebook();
  const units = useUnits();
  const mayWrite = useMay({ rule: ["write"] });
  const router = useRouter();
  const [initial] = useState(emptyForm);
  if (book.isPending) return <Loading />;
  if (book.error) return <LoadFailed error={book.error} />;
  return (
    <Screen>
      <BackLink href="/rulebook" label="Rulebook" />
      <Heading>Write a rule</Heading>
      {mayWrite ? (
        <RuleForm initial={initial} causes={book.data.causes} units={units} onSaved={(r) => router.replace(`/rulebook/${r.id}`)} />
      ) : (
        <Notice>Only mentors and owners write rules.</Notice>
      )}
    </Screen>
  );
}
