import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { castingKeys } from "@/hooks/use-castings";
import { request } from "@/lib/api";

/**
 * Runs the diagnosis on the stored casting. The answer is kept as the casting's latest snapshot,
 * which the casting page reads, so the page is refetched before the button lets go.
 */
export function useRunDiagnosis(castingId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => request("POST /diagnosis/castings/:id", { params: { id: castingId } }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: castingKeys.detail(castingId) }),
  });
}

/**
 * Whether the marks or conditions changed since the latest diagnosis. Kept under the casting's key, so
 * whatever refreshes the casting (a mark, the melt's conditions, a new diagnosis) asks again.
 */
export function useDiagnosisFreshness(castingId: number, enabled: boolean) {
  return useQuery({
    queryKey: [...castingKeys.detail(castingId), "freshness"],
    queryFn: () => request("GET /diagnosis/castings/:id/freshness", { params: { id: castingId } }),
    enabled,
  });
}
