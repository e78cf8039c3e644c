import { Link } from "expo-router";
import { StyleSheet, Text } from "react-native";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize } from "@/constants/theme";
import { formatMoment } from "@/lib/dates";
import type { InvitationView } from "@/lib/people-schemas";

/** A link that no longer works, said plainly with what to do next. */
export function InvitationClosed({ invitation: inv }: { invitation: InvitationView }) {
  const words: Record<string, string> = {
    expired: `This invitation to ${inv.shopName} ran out on ${formatMoment(inv.expiresAt)}. Ask ${inv.inviterName} to send it again: the same link will then work.`,
    cancelled: `This invitation to ${inv.shopName} was cancelled by the shop. Ask ${inv.inviterName} if you think it should stand.`,
    accepted: `This invitation to ${inv.shopName} has already been used. If that was you, sign in to see the shop.`,
    declined: `This invitation to ${inv.shopName} was turned down. Ask ${inv.inviterName} for a new one if you changed your mind.`,
  };
  return (
    <>
      <Notice tone="caution">
        <Text style={styles.text} testID="invitation-state">
          {words[inv.state]}
        </Text>
      </Notice>
      <Link href="/" style={styles.link}>
        Go to Shakeout Casebook
      </Link>
    </>
  );
}

const styles = StyleSheet.create({
  text: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
  link: { color: colors.accent, fontWeight: "600", fontSize: fontSize.body },
});
