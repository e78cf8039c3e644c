import { useMutation, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api";

export type ArchiveKind = "melt" | "casting";

/**
 * Archive and restore one melt or casting. Both change what every list shows, so every melt and
 * casting query (lists, pages, the casebook) is refetched.
 */
export function useArchive(kind: ArchiveKind, id: number) {
  const queryClient = useQueryClient();
  const base = kind === "melt" ? `/melts/${id}` : `/castings/${id}`;
  const refresh = () =>
    Promise.all([["melts"], ["castings"], ["search"]].map((queryKey) => queryClient.invalidateQueries({ queryKey })));
  const archive = useMutation({ mutationFn: () => api(`${base}/archive`, { method: "POST" }), onSuccess: refresh });
  const restore = useMutation({ mutationFn: () => api(`${base}/restore`, { method: "POST" }), onSuccess: refresh });
  return { archive, restore };
}
