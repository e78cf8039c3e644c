import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { useCancelInvitation, useInvitations, useResendInvitation } from "@/hooks/use-people";
import { formatMoment } from "@/lib/dates";

/** Invitations not yet used: when each runs out, and a re-send or cancel for each. */
export function PendingInvitations() {
  const list = useInvitations(true);
  const resend = useResendInvitation();
  const cancel = useCancelInvitation();
  if (list.error) return <Notice tone="error">{list.error.message}</Notice>;
  if (!list.data) return null;
  if (list.data.length === 0) return <Text style={styles.meta}>No invitations waiting.</Text>;
  const failure = resend.error ?? cancel.error;
  return (
    <View style={styles.list}>
      {failure ? <Notice tone="error">{failure.message}</Notice> : null}
      {list.data.map((inv) => (
        <View key={inv.id} style={styles.row} testID="pending-invitation">
          <View style={styles.words}>
            <Text style={styles.email}>{inv.email}</Text>
            <Text style={[styles.meta, inv.expired && styles.expired]}>
              {inv.role} · {inv.expired ? "ran out" : "works until"} {formatMoment(inv.expiresAt)} · by{" "}
              {inv.inviterName}
            </Text>
          </View>
          <View style={styles.actions}>
            <Button
              kind="plain"
              label="Re-send"
              busy={resend.isPending && resend.variables === inv.id}
              onPress={() => resend.mutate(inv.id)}
            />
            <Button
              kind="plain"
              label="Cancel"
              busy={cancel.isPending && cancel.variables === inv.id}
              onPress={() => cancel.mutate(inv.id)}
            />
          </View>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  row: {
    flexDirection: "row",
    flexWrap: "wrap",
    alignItems: "center",
    gap: space.md,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.md,
    padding: space.md,
  },
  words: { flexGrow: 1, flexShrink: 1, flexBasis: 220, gap: 2 },
  actions: { flexDirection: "row", gap: space.sm },
  email: { fontSize: fontSize.field, fontWeight: "600", color: colors.ink },
  meta: { fontSize: fontSize.detail, color: colors.muted },
  expired: { color: colors.danger },
});
