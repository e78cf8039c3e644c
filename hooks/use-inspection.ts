import { useState } from "react";
import type { MarkDescription } from "@/lib/notebook-schemas";
import { useCreateMark, useDeleteMark, useUpdateMark } from "@/hooks/use-marks";
import type { CastingDetail } from "@/lib/notebook-schemas";

export type InspectMode =
  | { kind: "idle" }
  | { kind: "new"; photoId: number | null; x: number | null; y: number | null }
  | { kind: "edit"; markId: number }
  | { kind: "move"; markId: number };

/**
 * What the casting's photo area is doing: nothing; placing a new mark (tap, then describe);
 * changing a mark; or moving one (select it, then tap the new spot).
 */
export function useInspection(casting: CastingDetail) {
  const [mode, setMode] = useState<InspectMode>({ kind: "idle" });
  const [selectedId, setSelectedId] = useState<number | null>(null);
  const create = useCreateMark(casting.id);
  const update = useUpdateMark(casting.id);
  const remove = useDeleteMark(casting.id);
  const pins = [...casting.marks].sort((a, b) => a.id - b.id).map((mark, i) => ({ number: i + 1, mark }));
  const busy = create.isPending || update.isPending || remove.isPending;
  const failure = (create.error ?? update.error ?? remove.error)?.message;
  const reset = () => [create, update, remove].forEach((m) => m.reset());

  function tapPhoto(photoId: number, x: number, y: number) {
    if (mode.kind === "move") {
      update.mutate({ id: mode.markId, change: { photoId, x, y } });
      setSelectedId(mode.markId);
      setMode({ kind: "idle" });
      return;
    }
    reset();
    setSelectedId(null);
    setMode({ kind: "new", photoId, x, y });
  }

  function openMark(markId: number) {
    reset();
    setSelectedId(markId);
    setMode({ kind: "edit", markId });
  }

  async function save(d: MarkDescription) {
    if (mode.kind === "new") {
      const mark = await create.mutateAsync({ ...d, photoId: mode.photoId, x: mode.x, y: mode.y }).catch(() => null);
      if (mark) {
        setSelectedId(mark.id);
        setMode({ kind: "idle" });
      }
    } else if (mode.kind === "edit") {
      const mark = await update.mutateAsync({ id: mode.markId, change: d }).catch(() => null);
      if (mark) setMode({ kind: "idle" });
    }
  }

  async function removeMark() {
    if (mode.kind !== "edit") return;
    const ok = await remove.mutateAsync(mode.markId).then(
      () => true,
      () => false,
    );
    if (ok) {
      setSelectedId(null);
      setMode({ kind: "idle" });
    }
  }

  return {
    mode,
    pins,
    selectedId,
    busy,
    failure,
    tapPhoto,
    openMark,
    save,
    removeMark,
    addWithoutPhoto: () => {
      reset();
      setSelectedId(null);
      setMode({ kind: "new", photoId: null, x: null, y: null });
    },
    startMove: () => mode.kind === "edit" && setMode({ kind: "move", markId: mode.markId }),
    cancel: () => {
      reset();
      setMode({ kind: "idle" });
    },
  };
}
