import { useState } from "react";
import { Platform, StyleSheet, Text } from "react-native";
import { Button } from "@/components/ui/button";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize } from "@/constants/theme";
import { chooseCsvFile, usePreviewImport, useRunImport, type LogFile } from "@/hooks/use-import";
import type { ImportMapping } from "@/lib/import-fields";
import { ColumnMapper } from "./column-mapper";
import { ImportPreviewView } from "./import-preview";

/**
 * Bringing an old pour log in: choose the CSV, check which column feeds which field and in what unit,
 * see what would be refused and why, then import the rest at once. Each step asks the server again,
 * so the preview is exactly what the import will do.
 */
export function PourLogImport() {
  const [log, setLog] = useState<LogFile | null>(null);
  const [mapping, setMapping] = useState<ImportMapping | null>(null);
  const preview = usePreviewImport();
  const run = useRunImport();

  if (Platform.OS !== "web") return <Notice>Import a pour log from the web app on a computer.</Notice>;

  async function choose() {
    const picked = await chooseCsvFile();
    if (!picked) return;
    setLog(picked);
    run.reset();
    // The first look guesses the mapping from the header; the owner's changes are sent from then on.
    const first = await preview.mutateAsync({ log: picked }).catch(() => null);
    setMapping(first?.mapping ?? null);
  }
  function remap(next: ImportMapping) {
    setMapping(next);
    run.reset();
    if (log) preview.mutate({ log, mapping: next });
  }

  const p = preview.data;
  const ready = !!p && !p.mappingProblems.length && p.counts.new > 0 && !preview.isPending;
  return (
    <>
      <Text style={styles.meta}>
        A CSV file (a spreadsheet saved as CSV), one casting per row with its melt's conditions. Rows with the same melt
        conditions become one melt. Importing the same rows again adds nothing.
      </Text>
      <Button
        kind="plain"
        label={log ? `Choose another file (${log.name})` : "Choose a CSV file"}
        onPress={choose}
        testID="import-choose"
      />
      {preview.error ? <Notice tone="error">{preview.error.message}</Notice> : null}
      {p && mapping && log ? (
        <>
          <Heading level={3}>What would happen</Heading>
          <ImportPreviewView preview={p} />
          {ready ? (
            <Button
              label={`Import ${p.counts.new} row${p.counts.new === 1 ? "" : "s"}`}
              busy={run.isPending}
              onPress={() => run.mutate({ log, mapping }, { onSuccess: () => preview.mutate({ log, mapping }) })}
              testID="import-run"
            />
          ) : null}
          {run.error ? <Notice tone="error">{run.error.message}</Notice> : null}
          {run.data ? (
            <Notice>
              {`Imported ${run.data.imported} casting${run.data.imported === 1 ? "" : "s"} in ${run.data.melts} melt${run.data.melts === 1 ? "" : "s"}.` +
                (run.data.refused.length ? ` ${run.data.refused.length} refused, listed above.` : "")}
            </Notice>
          ) : null}
          <Heading level={3}>Which column is which</Heading>
          <ColumnMapper headers={p.headers} sample={p.sample} mapping={mapping} onChange={remap} />
        </>
      ) : null}
    </>
  );
}

const styles = StyleSheet.create({ meta: { fontSize: fontSize.detail, color: colors.muted } });
