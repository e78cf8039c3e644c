import { Pressable, StyleSheet, Text, View } from "react-native";
import { printHidden } from "@/components/ui/print";
import { card, colors, fontSize, radius, space } from "@/constants/theme";
import type { CastingDetail } from "@/lib/notebook-schemas";
import { jumpTo } from "@/lib/page-sections";

type Props = { casting: CastingDetail };

/**
 * The casting at a glance, just under its name: what the rules make of it (the strongest cause and
 * its strength, or what to do before there is one), and links down the page to each part of the case,
 * so on a phone the causes are one tap away however long the page below is.
 */
export function CastingGlance({ casting }: Props) {
  const causes = casting.diagnosis?.result.causes ?? [];
  const top = causes[0];
  const links = [
    { name: "causes", label: causes.length ? `Causes (${causes.length})` : "Causes" },
    { name: "photos", label: `Photos (${casting.photos.length})` },
    { name: "details", label: "Details" },
    { name: "review", label: "Review and fix" },
    { name: "notes", label: `Notes (${casting.comments.length})` },
  ];
  return (
    <View style={styles.box} {...printHidden}>
      {top ? (
        <Pressable role="link" onPress={() => jumpTo("causes")} testID="top-cause" style={styles.top}>
          <Text style={styles.kicker}>Most likely, from the rules</Text>
          <Text style={styles.cause}>
            {top.title} <Text style={styles.score}>strength {top.score.toFixed(2)}</Text>
          </Text>
          <Text style={styles.more} testID="jump-causes">
            {causes.length > 1 ? `Fixes, reasons and ${causes.length - 1} more ›` : "Fixes and reasons ›"}
          </Text>
        </Pressable>
      ) : (
        <Pressable
          role="link"
          onPress={() => jumpTo(casting.marks.length ? "causes" : "photos")}
          testID="top-cause"
          style={styles.top}
        >
          <Text style={styles.kicker}>Likely causes</Text>
          <Text style={styles.more} testID="jump-causes">
            {casting.marks.length ? "Not worked out yet: find them ›" : "Mark a defect on a photo first ›"}
          </Text>
        </Pressable>
      )}
      <View style={styles.links} role="navigation" aria-label="Parts of this case">
        {links.map((l) => (
          <Pressable key={l.name} role="link" onPress={() => jumpTo(l.name)} style={styles.link}>
            <Text style={styles.linkText}>{l.label}</Text>
          </Pressable>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { ...card, padding: space.md, gap: space.md, borderLeftWidth: 4, borderLeftColor: colors.steel },
  top: { gap: 2 },
  kicker: { fontSize: fontSize.small, color: colors.muted, textTransform: "uppercase", letterSpacing: 0.5 },
  cause: { fontSize: fontSize.lead, fontWeight: "700", color: colors.ink },
  score: { fontSize: fontSize.detail, fontWeight: "400", color: colors.steel },
  more: { fontSize: fontSize.detail, color: colors.accent, fontWeight: "600" },
  links: { flexDirection: "row", flexWrap: "wrap", gap: space.sm },
  link: {
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.sm,
    paddingHorizontal: space.sm,
    paddingVertical: 6,
    minHeight: 32,
    justifyContent: "center",
  },
  linkText: { fontSize: fontSize.detail, color: colors.steel, fontWeight: "600" },
});
