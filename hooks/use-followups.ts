import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api";
import type { FixInput, FixPatch, FixTickInput, FixTried, Followups } from "@/lib/review-schemas";

/** A fix links two castings, so every casting's follow-ups may change with it: they are refetched together. */
export const followupKeys = { all: ["followups"] as const, casting: (id: number) => ["followups", id] as const };

export function useFollowups(castingId: number) {
  return useQuery({
    queryKey: followupKeys.casting(castingId),
    queryFn: () => api<Followups>(`/followups/castings/${castingId}`),
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
    api<FixTried>(`/followups/castings/${castingId}/fixes`, { method: "POST", body: input }),
  );
}

export function usePatchFix() {
  return useFixChange(({ id, ...patch }: FixPatch & { id: number }) =>
    api<FixTried>(`/followups/fixes/${id}`, { method: "PATCH", body: patch }),
  );
}

/** Ticks a fix to try on the casting; the tick shows at once, and the server's list is read back after. */
export function useTickFix(castingId: number) {
  const queryClient = useQueryClient();
  const key = followupKeys.casting(castingId);
  return useMutation({
    mutationFn: (input: FixTickInput) =>
      api<{ ticked: string[] }>(`/followups/castings/${castingId}/ticks`, { method: "PUT", body: input }),
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
