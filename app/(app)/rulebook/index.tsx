import { useRouter } from "expo-router";
import { useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { LoadFailed, Loading } from "@/components/ui/query-state";
import { RuleListItem } from "@/components/rulebook/rule-list-item";
import { Screen } from "@/components/ui/screen";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize, space } from "@/constants/theme";
import { useReviewQueue } from "@/hooks/use-review";
import { useMay, useRulebook } from "@/hooks/use-rulebook";
import { useUnits } from "@/hooks/use-units";
import { DEFECTS } from "@/lib/defects";
import type { RuleRow } from "@/lib/rulebook-schemas";

const PAGE = 40;
const SHOW = [
  { value: "all", label: "all" },
  { value: "shop", label: "written here" },
  { value: "built-in", label: "built in" },
  { value: "off", label: "not in use" },
];
const shows: Record<string, (r: RuleRow) => boolean> = {
  all: () => true,
  shop: (r) => r.source === "shop",
  "built-in": (r) => r.source === "built-in",
  off: (r) => !r.inUse,
};
const text = (r: RuleRow) =>
  [r.cause.title, r.family, ...r.explains.map((t) => DEFECTS[t].label)].join(" ").toLowerCase();

/** Every rule behind the diagnoses: the shop's own first, then the built-in ones, each with its record here. */
export default function RulebookScreen() {
  const book = useRulebook();
  const mayWrite = useMay({ rule: ["write"] });
  const mayReview = useMay({ review: ["confirm"] });
  const queue = useReviewQueue(mayReview);
  const units = useUnits();
  const router = useRouter();
  const [query, setQuery] = useState("");
  const [show, setShow] = useState("all");
  const [limit, setLimit] = useState(PAGE);
  if (book.isPending) return <Loading />;
  if (book.error) return <LoadFailed error={book.error} />;

  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  const rules = book.data.rules.filter((r) => shows[show](r) && words.every((w) => text(r).includes(w)));
  const inUse = book.data.rules.filter((r) => r.inUse).length;
  const waiting = queue.data?.length ?? 0;
  return (
    <Screen>
      <Heading>Rulebook</Heading>
      <Text style={styles.intro}>
        The rules behind each diagnosis: {inUse} in use here, built in or written by the shop's mentors.{" "}
        {book.data.confirmedCases
          ? `Each rule's record in the shop's ${book.data.confirmedCases} confirmed case${book.data.confirmedCases === 1 ? "" : "s"} tunes how much it counts.`
          : "Once mentors confirm causes, each rule's record here tunes how much it counts."}
      </Text>
      {mayWrite || mayReview ? (
        <View style={styles.actions}>
          {mayWrite ? (
            <Button label="Write a rule" onPress={() => router.push("/rulebook/new")} testID="write-rule" />
          ) : null}
          {mayReview ? (
            <Button
              kind="plain"
              label={`Cases waiting for review (${waiting})`}
              onPress={() => router.push("/rulebook/review")}
              testID="open-review"
            />
          ) : null}
        </View>
      ) : (
        <Notice>
          Mentors and owners write and change rules. If a diagnosis looks wrong, ask for a review on the casting's page.
        </Notice>
      )}
      <TextField
        label="Find a rule"
        value={query}
        onChangeText={(t) => {
          setQuery(t);
          setLimit(PAGE);
        }}
        placeholder="a cause or a defect: cold, porosity…"
      />
      <ChoiceChips
        label="Show"
        options={SHOW}
        value={show}
        onChange={(v) => {
          setShow(v);
          setLimit(PAGE);
        }}
      />
      {rules.length === 0 ? <Notice>No rule matches.</Notice> : null}
      <View style={styles.list}>
        {rules.slice(0, limit).map((r) => (
          <RuleListItem key={r.id} rule={r} units={units} />
        ))}
      </View>
      {rules.length > limit ? (
        <Button
          kind="plain"
          label={`Show more (${rules.length - limit} left)`}
          onPress={() => setLimit((l) => l + PAGE)}
        />
      ) : null}
    </Screen>
  );
}

const styles = StyleSheet.create({
  intro: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
  actions: { flexDirection: "row", flexWrap: "wrap", gap: space.md },
  list: { gap: space.sm },
});
