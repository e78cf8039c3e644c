import { useMutation, useQueryClient } from "@tanstack/react-query";
import { castingKeys } from "@/hooks/use-castings";
import { api } from "@/lib/api";
import type { DiagnosisSnapshot } from "@/lib/notebook-schemas";

/**
 * Runs the diagnosis on the stored casting. The answer is kept as the casting's latest snapshot,
 * which the casting page reads, so the page is refetched before the button lets go.
 */
export function useRunDiagnosis(castingId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => api<Omit<DiagnosisSnapshot, "createdBy">>(`/diagnosis/castings/${castingId}`, { method: "POST" }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: castingKeys.detail(castingId) }),
  });
}
