import { StyleSheet, Text, type StyleProp, type TextStyle } from "react-native";
import type { Marked } from "@/lib/search-schemas";

type Props = { runs?: Marked; plain: string; style?: StyleProp<TextStyle>; numberOfLines?: number };

/** A field of a search result with the words that matched picked out. */
export function MarkedText({ runs, plain, style, numberOfLines }: Props) {
  return (
    <Text style={style} numberOfLines={numberOfLines}>
      {runs
        ? runs.map((r, i) =>
            r.hit ? (
              <Text key={i} style={styles.hit} testID="search-hit">
                {r.text}
              </Text>
            ) : (
              r.text
            ),
          )
        : plain}
    </Text>
  );
}

const styles = StyleSheet.create({
  hit: { backgroundColor: "#FFE8A3", fontWeight: "700", borderRadius: 2 },
});
