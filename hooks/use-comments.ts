import { useMutation } from "@tanstack/react-query";
import { api } from "@/lib/api";
import type { Comment } from "@/lib/notebook-schemas";
import { useRefreshCasting } from "./use-castings";

/** Adds a comment to a casting's thread; the casting page (which carries the thread) refreshes. */
export function useAddComment(castingId: number) {
  const refresh = useRefreshCasting();
  return useMutation({
    mutationFn: (body: string) => api<Comment>(`/comments/castings/${castingId}`, { method: "POST", body: { body } }),
    onSuccess: () => refresh(castingId),
  });
}
