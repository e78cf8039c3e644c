import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api";
import type { Trends, TrendsQuery } from "@/lib/trends-schemas";

export function useTrends(q: TrendsQuery) {
  const search = new URLSearchParams(Object.entries(q).filter(([, v]) => v) as [string, string][]);
  return useQuery({
    queryKey: ["trends", q],
    queryFn: () => api<Trends>(`/trends?${search}`),
    placeholderData: keepPreviousData,
  });
}
