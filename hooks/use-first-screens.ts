import { useQueryClient } from "@tanstack/react-query";
import { useEffect } from "react";
import { FIRST_MELTS_PAGE, meltsQuery } from "@/hooks/use-melts";
import { unitsQuery } from "@/hooks/use-units";

/**
 * Starts what the first screens need at the same moment as the shop check (GET /api/shops/me) instead
 * of after it: the person's units and the first page of the pour log. Each answer waits in the query
 * cache, so opening Melts after sign-in shows cards without another round trip.
 */
export function usePrefetchFirstScreens() {
  const queryClient = useQueryClient();
  useEffect(() => {
    void queryClient.prefetchQuery(unitsQuery);
    void queryClient.prefetchInfiniteQuery(meltsQuery(FIRST_MELTS_PAGE));
  }, [queryClient]);
}
