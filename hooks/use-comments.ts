import { useMutation } from "@tanstack/react-query";
import { request } from "@/lib/api";
import { useRefreshCasting } from "./use-castings";

/** Adds a comment to a casting's thread; the casting page (which carries the thread) refreshes. */
export function useAddComment(castingId: number) {
  const refresh = useRefreshCasting();
  return useMutation({
    mutationFn: (body: string) => request("POST /comments/castings/:id", { params: { id: castingId }, body: { body } }),
    onSuccess: () => refresh(castingId),
  });
}
