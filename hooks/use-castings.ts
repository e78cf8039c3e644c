import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api";
import type { Casting, CastingDetail, CastingInput } from "@/lib/notebook-schemas";

export const castingKeys = {
  all: ["castings"] as const,
  detail: (id: number) => ["castings", "detail", id] as const,
};

export function useCasting(id: number) {
  return useQuery({
    queryKey: castingKeys.detail(id),
    queryFn: () => api<CastingDetail>(`/castings/${id}`),
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

export function useCreateCasting(meltId: number) {
  const refresh = useRefreshCasting();
  return useMutation({
    mutationFn: (input: CastingInput) => api<Casting>(`/castings/melts/${meltId}`, { method: "POST", body: input }),
    onSuccess: () => refresh(),
  });
}

export function useUpdateCasting(id: number) {
  const refresh = useRefreshCasting();
  return useMutation({
    mutationFn: (input: Partial<CastingInput>) => api<Casting>(`/castings/${id}`, { method: "PATCH", body: input }),
    onSuccess: () => refresh(id),
  });
}
