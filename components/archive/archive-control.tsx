import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, space } from "@/constants/theme";
import { useArchive, type ArchiveKind } from "@/hooks/use-archive";
import { useMe } from "@/hooks/use-me";
import { mayArchive, mayRestore, mayUndoArchive } from "@/lib/archive-rules";
import { formatMoment } from "@/lib/dates";
import type { Archived, PersonRef } from "@/lib/notebook-schemas";

type Props = { kind: ArchiveKind; row: Archived & { id: number; createdBy: PersonRef } };

/**
 * On a melt's or casting's page: "Archive" for those who may, and once archived a notice that says so,
 * with "Undo" for whoever just archived it and "Restore" for an owner.
 */
export function ArchiveControl({ kind, row }: Props) {
  const me = useMe().data;
  const { archive, restore } = useArchive(kind, row.id);
  if (!me?.activeShop) return null;
  const who = { role: me.activeShop.role, userId: me.user.id };
  const state = { createdBy: row.createdBy.id, archivedAt: row.archivedAt, archivedBy: row.archivedBy?.id ?? null };
  const failure = archive.error ?? restore.error;
  const error = failure ? <Notice tone="error">{failure.message}</Notice> : null;

  if (!row.archivedAt) {
    if (!mayArchive(who, state)) return null;
    return (
      <View style={styles.bar}>
        <View style={styles.actions}>
          <Button
            kind="plain"
            label={`Archive this ${kind}`}
            onPress={() => archive.mutate()}
            busy={archive.isPending}
            testID={`archive-${kind}`}
          />
        </View>
        {error}
      </View>
    );
  }
  const undo = mayUndoArchive(who, state);
  return (
    <View testID="archived-notice" style={styles.bar}>
      <Notice tone="caution">
        <Text style={styles.title}>
          {undo ? `This ${kind} is archived.` : `Archived ${formatMoment(row.archivedAt)} by ${row.archivedBy?.name}.`}
        </Text>
        <Text style={styles.text}>
          {kind === "melt"
            ? "It and its castings are hidden from the lists; nothing was deleted."
            : "It is hidden from the lists; nothing was deleted."}
          {mayRestore(who, state) ? "" : " A shop owner can bring it back."}
        </Text>
      </Notice>
      {mayRestore(who, state) ? (
        <View style={styles.actions}>
          <Button
            kind={undo ? "primary" : "plain"}
            label={undo ? "Undo" : `Restore this ${kind}`}
            onPress={() => restore.mutate()}
            busy={restore.isPending}
          />
        </View>
      ) : null}
      {error}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: { gap: space.sm },
  actions: { flexDirection: "row", gap: space.sm },
  title: { fontSize: fontSize.body, fontWeight: "600", color: colors.ink },
  text: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
});
