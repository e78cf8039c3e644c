import { keepPreviousData, useInfiniteQuery, useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { castingKeys } from "@/hooks/use-castings";
import { SAVE_KEYS } from "@/hooks/use-offline-saves";
import { request } from "@/lib/api";
import type { Answer } from "@/lib/api-routes";
import type { MeltInput, MELT_SORTS } from "@/lib/notebook-schemas";

export type MeltSort = (typeof MELT_SORTS)[number];
export type MeltListQuery = { pageSize: number; sort: MeltSort };

export const meltKeys = {
  all: ["melts"] as const,
  list: (q: MeltListQuery) => ["melts", "list", q] as const,
  detail: (id: number) => ["melts", "detail", id] as const,
  defaults: ["melts", "defaults"] as const,
};
export const alloysKey = ["alloys"] as const;

export function useAlloys() {
  return useQuery({
    queryKey: alloysKey,
    queryFn: () => request("GET /alloys", {}).then((r) => r.alloys),
    staleTime: 10 * 60_000,
  });
}

/** The pour log as it first opens: the shell fetches it beside the person's shop (hooks/use-first-screens.ts). */
export const FIRST_MELTS_PAGE: MeltListQuery = { pageSize: 20, sort: "date-desc" };

/** Pages by keyset: each page asks for the rows after the last one shown (`next`, sent as `after`). */
export const meltsQuery = (q: MeltListQuery) => ({
  queryKey: meltKeys.list(q),
  queryFn: ({ pageParam }: { pageParam: string | null }) =>
    request("GET /melts", {
      query: { pageSize: q.pageSize, sort: q.sort, ...(pageParam ? { after: pageParam } : {}) },
    }),
  initialPageParam: null as string | null,
  getNextPageParam: (last: Answer<"GET /melts">) => last.next,
});

export function useMelts(q: MeltListQuery) {
  // The last order's rows stay on screen while the new order loads, so the list does not jump.
  return useInfiniteQuery({ ...meltsQuery(q), placeholderData: keepPreviousData });
}

export function useMelt(id: number) {
  return useQuery({
    queryKey: meltKeys.detail(id),
    queryFn: () => request("GET /melts/:id", { params: { id } }),
    enabled: Number.isInteger(id),
  });
}

/** What a new melt starts from: the shop's defaults and the last melt's furnace and alloy. Always fresh. */
export function useMeltDefaults() {
  return useQuery({
    queryKey: meltKeys.defaults,
    queryFn: () => request("GET /melts/defaults", {}),
    staleTime: 0,
  });
}

/** Its function is a default of the QueryClient (hooks/use-offline-saves.ts), so a save made offline waits and goes later. */
export function useCreateMelt() {
  return useMutation<Answer<"POST /melts">, Error, MeltInput>({ mutationKey: SAVE_KEYS.melt });
}

export function useUpdateMelt(id: number) {
  const queryClient = useQueryClient();
  return useMutation({
    /** `version` is the one the form opened at: a save over someone else's later edit answers 412. */
    mutationFn: ({ input, version }: { input: Partial<MeltInput>; version?: number }) =>
      request("PATCH /melts/:id", { params: { id }, body: input, ifMatch: version }),
    // A casting's page shows its melt's conditions too.
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: meltKeys.all }),
        queryClient.invalidateQueries({ queryKey: castingKeys.all }),
      ]),
  });
}
