import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { request } from "@/lib/api";
import type { FixInput, FixPatch, FixTickInput, FixTried, Followups } from "@/lib/review-schemas";

/** A fix links two castings, so every casting's follow-ups may change with it: they are refetched together. */
export const followupKeys = { all: ["followups"] as const, casting: (id: number) => ["followups", id] as const };

export function useFollowups(castingId: number) {
  return useQuery({
    queryKey: followupKeys.casting(castingId),
    queryFn: () => request("GET /followups/castings/:id", { params: { id: castingId } }),
  });
}

function useFixChange<T>(fn: (arg: T) => Promise<FixTried>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: followupKeys.all }),
  });
}

export function useAddFix(castingId: number) {
  return useFixChange((input: FixInput) =>
    request("POST /followups/castings/:id/fixes", { params: { id: castingId }, body: input }),
  );
}

export function usePatchFix() {
  return useFixChange(({ id, ...patch }: FixPatch & { id: number }) =>
    request("PATCH /followups/fixes/:id", { params: { id }, body: patch }),
  );
}

/** Ticks a fix to try on the casting; the tick shows at once, and the server's list is read back after. */
export function useTickFix(castingId: number) {
  const queryClient = useQueryClient();
  const key = followupKeys.casting(castingId);
  return useMutation({
    mutationFn: (input: FixTickInput) =>
      request("PUT /followups/castings/:id/ticks", { params: { id: castingId }, body: input }),
    onMutate: async ({ fix, ticked }) => {
      await queryClient.cancelQueries({ queryKey: key });
      queryClient.setQueryData<Followups>(key, (f) =>
        f
          ? { ...f, ticked: ticked ? [...f.ticked.filter((t) => t !== fix), fix] : f.ticked.filter((t) => t !== fix) }
          : f,
      );
    },
    onSuccess: ({ ticked }) => queryClient.setQueryData<Followups>(key, (f) => (f ? { ...f, ticked } : f)),
    // A tap while the follow-ups were still loading cancelled that load: fetch them again either way.
    onSettled: () => queryClient.invalidateQueries({ queryKey: key }),
  });
}
