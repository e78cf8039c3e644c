import { useMutation, useQueryClient } from "@tanstack/react-query";
import { castingKeys, useRefreshCasting } from "@/hooks/use-castings";
import { request } from "@/lib/api";
import type { CastingDetail, Mark, MarkInput } from "@/lib/notebook-schemas";

export function useCreateMark(castingId: number) {
  const refresh = useRefreshCasting();
  return useMutation({
    mutationFn: (input: MarkInput) => request("POST /marks/castings/:id", { params: { id: castingId }, body: input }),
    onSuccess: () => refresh(castingId),
  });
}

/** A change to a mark; the pin moves at once (a move should not wait for the server) and is put back on failure. */
export function useUpdateMark(castingId: number) {
  const queryClient = useQueryClient();
  const refresh = useRefreshCasting();
  const key = castingKeys.detail(castingId);
  return useMutation({
    mutationFn: ({ id, change }: { id: number; change: Partial<MarkInput> }) =>
      request("PATCH /marks/:id", { params: { id }, body: change }),
    onMutate: async ({ id, change }) => {
      await queryClient.cancelQueries({ queryKey: key });
      const before = queryClient.getQueryData<CastingDetail>(key);
      if (before) {
        const marks = before.marks.map((m) => (m.id === id ? ({ ...m, ...change } as Mark) : m));
        queryClient.setQueryData<CastingDetail>(key, { ...before, marks });
      }
      return { before };
    },
    onError: (_e, _v, ctx) => ctx?.before && queryClient.setQueryData(key, ctx.before),
    onSettled: () => refresh(castingId),
  });
}

export function useDeleteMark(castingId: number) {
  const refresh = useRefreshCasting();
  return useMutation({
    mutationFn: (id: number) => request("DELETE /marks/:id", { params: { id } }),
    onSuccess: () => refresh(castingId),
  });
}
