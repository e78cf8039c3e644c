import type { ReactNode } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Heading } from "@/components/ui/heading";
import { MarkEditor } from "@/components/marks/mark-editor";
import { MarkList } from "@/components/marks/mark-list";
import { PhotoAdd } from "@/components/photos/photo-add";
import { PhotoDropZone } from "@/components/photos/photo-drop-zone";
import { PhotoPanel } from "@/components/photos/photo-panel";
import { PrintHidden, printHidden, printStacked } from "@/components/ui/print";
import { colors, fontSize, space } from "@/constants/theme";
import { useInspection } from "@/hooks/use-inspection";
import { fromFile } from "@/hooks/use-photo-picker";
import { usePhotoIntake } from "@/hooks/use-photos";
import type { CastingDetail } from "@/lib/notebook-schemas";

/**
 * Photos and defect marks of one casting. On a phone the mark form opens right under the photo
 * that was tapped; on a wide screen it sits beside the photos, with the list of marks.
 */
export function Inspection({ casting, wide }: { casting: CastingDetail; wide: boolean }) {
  const ins = useInspection(casting);
  const intake = usePhotoIntake(casting.id);
  const photoNumbers = new Map(casting.photos.map((p, i) => [p.id, i + 1]));
  const { mode } = ins;
  const editing = mode.kind === "edit" ? ins.pins.find((p) => p.mark.id === mode.markId) : undefined;
  const editorPhotoId = mode.kind === "new" ? mode.photoId : editing ? editing.mark.photoId : undefined;

  const editor =
    mode.kind === "new" || editing ? (
      <MarkEditor
        key={mode.kind === "new" ? `new-${mode.photoId}-${mode.x}-${mode.y}` : `edit-${editing!.mark.id}`}
        title={editing ? `Mark ${editing.number}` : "New mark"}
        mark={editing?.mark}
        busy={ins.busy}
        failure={ins.failure}
        onSave={ins.save}
        onCancel={ins.cancel}
        onRemove={editing ? ins.removeMark : undefined}
        onMove={editing && casting.photos.length ? ins.startMove : undefined}
      />
    ) : null;
  const inlineEditor = (photoId: number | null): ReactNode => (!wide && editorPhotoId === photoId ? editor : null);
  const moving = mode.kind === "move" ? ins.pins.find((p) => p.mark.id === mode.markId) : undefined;

  const photos = (
    <PhotoDropZone enabled={wide} onFiles={(files) => intake.add({ candidates: files.map(fromFile), refused: [] })}>
      <PrintHidden>
        <PhotoAdd
          add={intake.add}
          busy={intake.busy}
          progress={intake.progress}
          messages={intake.messages}
          wide={wide}
        />
      </PrintHidden>
      {moving ? (
        <Text style={styles.moving} role="status">
          Tap the new spot for mark {moving.number}.
        </Text>
      ) : casting.photos.length ? (
        <Text style={styles.hint} {...printHidden}>
          Tap a photo where you see a defect to mark it.
        </Text>
      ) : null}
      {casting.photos.map((p) => (
        <View key={p.id} style={styles.photo}>
          <PhotoPanel
            photo={p}
            number={photoNumbers.get(p.id)!}
            pins={ins.pins.filter((x) => x.mark.photoId === p.id)}
            selectedId={ins.selectedId}
            pending={mode.kind === "new" && mode.photoId === p.id && mode.x !== null ? { x: mode.x, y: mode.y! } : null}
            onTap={(x, y) => ins.tapPhoto(p.id, x, y)}
            onPin={(m) => ins.openMark(m.id)}
            castingId={casting.id}
          />
          {inlineEditor(p.id)}
        </View>
      ))}
    </PhotoDropZone>
  );
  const marks = (
    <View style={styles.side}>
      {wide ? editor : null}
      <Heading level={3}>Marks</Heading>
      <MarkList
        pins={ins.pins}
        selectedId={ins.selectedId}
        onOpen={(p) => ins.openMark(p.mark.id)}
        photoNumbers={photoNumbers}
      />
      {inlineEditor(null)}
      {mode.kind === "idle" ? (
        <Button kind="plain" label="Add a mark without a photo" onPress={ins.addWithoutPhoto} />
      ) : null}
    </View>
  );
  return wide ? (
    <View style={styles.twoPane} {...printStacked}>
      <View style={styles.left}>{photos}</View>
      {marks}
    </View>
  ) : (
    <>
      {photos}
      {marks}
    </>
  );
}

const styles = StyleSheet.create({
  twoPane: { flexDirection: "row", gap: space.xl, alignItems: "flex-start" },
  left: { flex: 3, minWidth: 0 },
  side: { flex: 2, minWidth: 0, gap: space.md },
  photo: { gap: space.sm },
  hint: { fontSize: fontSize.detail, color: colors.muted },
  moving: { fontSize: fontSize.body, color: colors.steel, fontWeight: "700" },
});
