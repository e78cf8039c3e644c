import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { request } from "@/lib/api";
import type { TrendsQuery } from "@/lib/trends-schemas";

export function useTrends(q: TrendsQuery) {
  // Empty filters stay out of the query string.
  const query = Object.fromEntries(Object.entries(q).filter(([, v]) => v)) as Record<string, string>;
  return useQuery({
    queryKey: ["trends", q],
    queryFn: () => request("GET /trends", { query }),
    placeholderData: keepPreviousData,
  });
}
