import { useRouter } from "expo-router";
import { useState } from "react";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { LoadFailed, Loading } from "@/components/ui/query-state";
import { RuleForm } from "@/components/rulebook/rule-form";
import { Screen } from "@/components/ui/screen";
import { useMay, useRulebook } from "@/hooks/use-rulebook";
import { emptyForm } from "@/hooks/use-rule-draft";
import { useUnitsQuery } from "@/hooks/use-units";
import { SI_UNITS } from "@/lib/units";

/** A new rule, written as a draft; it is published from its own page once tried. */
export default function NewRuleScreen() {
  const book = useRulebook();
  // The form shows values in the person's units: wait for them, or typed values would be read in the wrong ones.
  const unitsQuery = useUnitsQuery();
  const units = unitsQuery.data ?? SI_UNITS;
  const mayWrite = useMay({ rule: ["write"] });
  const router = useRouter();
  const [initial] = useState(emptyForm);
  if (book.isPending || unitsQuery.isPending) return <Loading />;
  if (book.error) return <LoadFailed error={book.error} />;
  return (
    <Screen>
      <BackLink href="/rulebook" label="Rulebook" />
      <Heading>Write a rule</Heading>
      {mayWrite ? (
        <RuleForm
          initial={initial}
          causes={book.data.causes}
          units={units}
          onSaved={(r) => router.replace(`/rulebook/${r.id}`)}
        />
      ) : (
        <Notice>Only mentors and owners write rules.</Notice>
      )}
    </Screen>
  );
}
