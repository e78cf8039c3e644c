import { keepPreviousData, useQuery } from "@tanstack/react-query";
import { useEffect, useState } from "react";
import { request } from "@/lib/api";
import type { SearchRequest } from "@/lib/search-schemas";

/** The casebook: search (GET /api/search) and "cases like this one" (GET /api/search/castings/:id/similar). */
export const searchKeys = {
  all: ["search"] as const,
  query: (q: SearchRequest) => ["search", q] as const,
  similar: (castingId: number) => ["search", "similar", castingId] as const,
};

/** Lists travel as "a,b"; empty values stay out of the URL. */
export function searchParams(q: SearchRequest): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, value] of Object.entries(q)) {
    const text = Array.isArray(value) ? value.join(",") : value === undefined || value === null ? "" : String(value);
    if (text.trim()) out[key] = text;
  }
  return out;
}

/** A value that settles `ms` after the last change: the search answers as you type, not per key. */
export function useDebounced<T>(value: T, ms = 250): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const t = setTimeout(() => setSettled(value), ms);
    return () => clearTimeout(t);
  }, [value, ms]);
  return settled;
}

export const caseSearchQuery = (query: SearchRequest) => ({
  queryKey: searchKeys.query(query),
  queryFn: () => request("GET /search", { query: searchParams(query) }),
});

/** An answer this young was fetched for this very screen (the first page, at sign-in): not asked again. */
const JUST_FETCHED_MS = 3_000;

/**
 * One page of matching cases. The previous answer stays on screen while the next loads, and an
 * answer from cache is shown but asked for again (another person may have logged a case since),
 * unless it is only a moment old.
 */
export function useCaseSearch(query: SearchRequest) {
  return useQuery({
    ...caseSearchQuery(query),
    placeholderData: keepPreviousData,
    staleTime: 0,
    refetchOnMount: (q) => Date.now() - q.state.dataUpdatedAt > JUST_FETCHED_MS,
  });
}

export function useSimilarCases(castingId: number) {
  return useQuery({
    queryKey: searchKeys.similar(castingId),
    queryFn: () => request("GET /search/castings/:id/similar", { params: { id: castingId } }),
    enabled: Number.isInteger(castingId),
    staleTime: 0,
  });
}
