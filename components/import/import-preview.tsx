import { StyleSheet, Text, View } from "react-native";
import { Notice } from "@/components/ui/notice";
import { card, colors, fontSize, space } from "@/constants/theme";
import type { ImportPreview as Preview, PreviewRow } from "@/lib/import-fields";

const STATUS_WORDS = {
  new: "to import",
  "already-imported": "imported before",
  "repeated-in-file": "repeated in this file",
  refused: "refused",
} as const;

/** What the import would do: the count of each kind of row, then every refused row with its reasons. */
export function ImportPreviewView({ preview }: { preview: Preview }) {
  if (preview.mappingProblems.length)
    return (
      <Notice tone="error">
        <Text style={styles.text}>Before a preview, the columns need fixing:</Text>
        {preview.mappingProblems.map((p) => (
          <Text key={p} style={styles.text}>
            • {p}
          </Text>
        ))}
      </Notice>
    );
  const refused = preview.rows.filter((r) => r.status === "refused");
  return (
    <View style={styles.box} testID="import-preview">
      <Text style={styles.counts}>
        {Object.entries(preview.counts)
          .filter(([, n]) => n > 0)
          .map(([s, n]) => `${n} ${STATUS_WORDS[s as keyof typeof STATUS_WORDS]}`)
          .join(" · ") || "No rows"}
      </Text>
      {refused.length ? <Text style={styles.sub}>Refused rows (fix them in the file and import it again):</Text> : null}
      {refused.map((r) => (
        <RefusedRow key={r.line} row={r} />
      ))}
    </View>
  );
}

function RefusedRow({ row }: { row: PreviewRow }) {
  return (
    <View style={styles.refused} testID={`refused-line-${row.line}`}>
      <Text style={styles.line}>Line {row.line}</Text>
      {Object.entries(row.problems).map(([field, problem]) => (
        <Text key={field} style={styles.text}>
          {field}: {problem}
        </Text>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { ...card, padding: space.md, gap: space.sm },
  counts: { fontSize: fontSize.lead, fontWeight: "700", color: colors.ink },
  sub: { fontSize: fontSize.detail, color: colors.muted },
  refused: { borderLeftWidth: 3, borderLeftColor: colors.danger, paddingLeft: space.sm, gap: 2 },
  line: { fontSize: fontSize.detail, fontWeight: "700", color: colors.danger },
  text: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
});
