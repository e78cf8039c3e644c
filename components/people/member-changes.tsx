import { StyleSheet, Text, View } from "react-native";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, space } from "@/constants/theme";
import { useMemberChanges } from "@/hooks/use-people";
import type { MemberChange } from "@/lib/people-schemas";
import { formatMoment } from "@/lib/dates";
import { MEMBER_CHANGE_WORDS } from "@/lib/people-schemas";

/** "invited a@b.example (mentor)"; joining and leaving concern the actor, so they name no one else. */
function sentence(c: MemberChange): string {
  const verb = MEMBER_CHANGE_WORDS[c.action] ?? c.action;
  const whom = c.action === "joined" || c.action === "left" ? "" : ` ${c.subjectEmail}`;
  return `${verb}${whom}${c.detail ? ` (${c.detail})` : ""}`;
}

/** Who changed what about the shop's people, and when: newest first. */
export function MemberChanges() {
  const changes = useMemberChanges(true);
  if (changes.error) return <Notice tone="error">{changes.error.message}</Notice>;
  if (!changes.data) return null;
  if (changes.data.length === 0) return <Text style={styles.meta}>No changes yet.</Text>;
  return (
    <View style={styles.list}>
      {changes.data.map((c) => (
        <View key={c.id} style={styles.row} testID="member-change">
          <Text style={styles.line}>
            <Text style={styles.who}>{c.actorName}</Text> {sentence(c)}
          </Text>
          <Text style={styles.meta}>{formatMoment(c.at)}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: { gap: 2, borderBottomWidth: 1, borderBottomColor: colors.line, paddingBottom: space.sm },
  line: { fontSize: fontSize.body, color: colors.ink, lineHeight: 21 },
  who: { fontWeight: "600" },
  meta: { fontSize: fontSize.small, color: colors.muted },
});
