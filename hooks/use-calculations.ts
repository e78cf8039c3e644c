import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { request } from "@/lib/api";
import type { CalculatorKind } from "@/rules/calculators";

export type CalcTarget = { meltId?: number; castingId?: number };
// Asked only once one of them is set (`enabled` below).
const targetQuery = (t: CalcTarget): Record<string, string | number> =>
  t.castingId ? { castingId: t.castingId } : { meltId: String(t.meltId) };
export const calculationKeys = { all: ["calculations"] as const, of: (t: CalcTarget) => ["calculations", t] as const };

/** Results saved on a melt or casting, newest first. */
export function useCalculations(t: CalcTarget) {
  return useQuery({
    queryKey: calculationKeys.of(t),
    queryFn: () => request("GET /calculations", { query: targetQuery(t) }).then((r) => r.items),
    enabled: !!(t.meltId || t.castingId),
  });
}

export function useSaveCalculation() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (body: CalcTarget & { kind: CalculatorKind; input: Record<string, unknown> }) =>
      request("POST /calculations", { body }),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: calculationKeys.all }),
  });
}
