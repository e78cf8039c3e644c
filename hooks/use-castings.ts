import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { SAVE_KEYS, type CastingSave } from "@/hooks/use-offline-saves";
import { request } from "@/lib/api";
import type { Answer } from "@/lib/api-routes";
import type { CastingInput } from "@/lib/notebook-schemas";

export const castingKeys = {
  all: ["castings"] as const,
  detail: (id: number) => ["castings", "detail", id] as const,
};

export function useCasting(id: number) {
  return useQuery({
    queryKey: castingKeys.detail(id),
    queryFn: () => request("GET /castings/:id", { params: { id } }),
    enabled: Number.isInteger(id),
  });
}

/** After any change to a casting, its page and the melt pages that list it are stale. */
export function useRefreshCasting() {
  const queryClient = useQueryClient();
  return (castingId?: number) =>
    Promise.all([
      queryClient.invalidateQueries({ queryKey: castingId ? castingKeys.detail(castingId) : castingKeys.all }),
      queryClient.invalidateQueries({ queryKey: ["melts"] }),
    ]);
}

/** Its function is a default of the QueryClient (hooks/use-offline-saves.ts), so a save made offline waits and goes later. */
export function useCreateCasting() {
  return useMutation<Answer<"POST /castings/melts/:id">, Error, CastingSave>({ mutationKey: SAVE_KEYS.casting });
}

export function useUpdateCasting(id: number) {
  const refresh = useRefreshCasting();
  return useMutation({
    /** `version` is the one the form opened at: a save over someone else's later edit answers 412. */
    mutationFn: ({ input, version }: { input: Partial<CastingInput>; version?: number }) =>
      request("PATCH /castings/:id", { params: { id }, body: input, ifMatch: version }),
    onSuccess: () => refresh(id),
  });
}
