import { Linking, Pressable, StyleSheet, Text, View } from "react-native";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { Screen } from "@/components/ui/screen";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { useInbox } from "@/hooks/use-people";
import { formatMoment } from "@/lib/dates";

/** Development only: the messages the local mail catcher received, newest first, links clickable. */
export default function InboxScreen() {
  const inbox = useInbox();
  return (
    <Screen>
      <BackLink href="/more" label="More" />
      <Heading>Development inbox</Heading>
      <Text style={styles.meta}>
        Mail the local catcher received (also saved as .eml files under .data/mail). Not part of a production server.
      </Text>
      {inbox.error ? <Notice tone="error">{inbox.error.message}</Notice> : null}
      {inbox.data?.length === 0 ? <Text style={styles.meta}>No mail caught yet.</Text> : null}
      {inbox.data?.map((m) => (
        <View key={m.id} style={styles.message} testID="caught-message">
          <Text style={styles.subject}>{m.subject}</Text>
          <Text style={styles.meta}>
            to {m.to.join(", ")} · {formatMoment(m.date)}
          </Text>
          <Text style={styles.body}>{m.text}</Text>
          {m.links.map((url) => (
            <Pressable key={url} role="link" onPress={() => Linking.openURL(url)}>
              <Text style={styles.link}>{url}</Text>
            </Pressable>
          ))}
        </View>
      ))}
    </Screen>
  );
}

const styles = StyleSheet.create({
  message: {
    gap: space.xs,
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.md,
    padding: space.md,
  },
  subject: { fontSize: fontSize.field, fontWeight: "600", color: colors.ink },
  meta: { fontSize: fontSize.detail, color: colors.muted },
  body: { fontSize: fontSize.detail, color: colors.ink, lineHeight: 20 },
  link: { color: colors.accent, fontSize: fontSize.detail, fontWeight: "600", textDecorationLine: "underline" },
});
