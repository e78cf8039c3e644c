import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api";
import type { SavedCalculation } from "@/lib/calculator-schemas";
import type { CalculatorKind } from "@/rules/calculators";

export type CalcTarget = { meltId?: number; castingId?: number };
const targetQuery = (t: CalcTarget) => (t.castingId ? `castingId=${t.castingId}` : `meltId=${t.meltId}`);
export const calculationKeys = { all: ["calculations"] as const, of: (t: CalcTarget) => ["calculations", t] as const };

/** Results saved on a melt or casting, newest first. */
export function useCalculations(t: CalcTarget) {
  return useQuery({
    queryKey: calculationKeys.of(t),
    queryFn: () => api<{ items: SavedCalculation[] }>(`/calculations?${targetQuery(t)}`).then((r) => r.items),
    enabled: !!(t.meltId || t.castingId),
  });
}

export function useSaveCalculation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CalcTarget & { kind: CalculatorKind; input: Record<string, unknown> }) =>
      api<SavedCalculation>("/calculations", { method: "POST", body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: calculationKeys.all }),
  });
}
