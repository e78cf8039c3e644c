import { Link } from "expo-router";
import { StyleSheet, Text, View } from "react-native";
import { card, colors, fontSize, space } from "@/constants/theme";
import { WORKED_LABELS, type ChainLink } from "@/lib/review-schemas";
import { castingWords } from "@/lib/case-words";

/** The part's castings linked by fixes, oldest first: what was tried between them and whether it worked. */
export function FollowupChain({ chain }: { chain: ChainLink[] }) {
  return (
    <View style={styles.list} testID="followup-chain">
      {chain.map((link) => (
        <View key={link.casting.id} style={styles.step}>
          {link.current ? (
            <Text style={[styles.casting, styles.current]}>{castingWords(link.casting)} · this casting</Text>
          ) : (
            <Link href={`/melts/${link.casting.meltId}/castings/${link.casting.id}`} style={styles.casting}>
              {castingWords(link.casting)}
            </Link>
          )}
          {link.fixes
            .filter((f) => f.next)
            .map((f) => (
              <Text key={f.id} style={styles.fix}>
                ↓ {f.fix}
                {f.worked ? ` — ${WORKED_LABELS[f.worked]}` : " — not judged yet"}
              </Text>
            ))}
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { ...card, gap: space.xs, padding: space.md },
  step: { gap: 2 },
  casting: { fontSize: fontSize.body, fontWeight: "700", color: colors.accent },
  current: { color: colors.ink },
  fix: { fontSize: fontSize.detail, lineHeight: 20, color: colors.steel, paddingLeft: space.md },
});
