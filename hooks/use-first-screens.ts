import { useQueryClient, type QueryClient } from "@tanstack/react-query";
import { useEffect } from "react";
import { meQuery } from "@/hooks/use-me";
import { FIRST_MELTS_PAGE, meltsQuery } from "@/hooks/use-melts";
import { unitsQuery } from "@/hooks/use-units";

/**
 * What the first screens need: the person and their shop (GET /api/shops/me, which the shell waits
 * for), their units and the first page of the pour log. Each answer waits in the query cache, so the
 * shell and Melts open without another round trip.
 */
function prefetchFirstScreens(queryClient: QueryClient) {
  void queryClient.prefetchQuery(meQuery);
  void queryClient.prefetchQuery(unitsQuery);
  void queryClient.prefetchInfiniteQuery(meltsQuery(FIRST_MELTS_PAGE));
}

/**
 * For the sign-in form: starts those requests as soon as sign-in answers, beside the session check
 * that the guard makes next, instead of after it (the sign-in answer has set the session cookie they
 * need). Measured by `npm run bench:web`.
 */
export function useStartFirstScreens() {
  const queryClient = useQueryClient();
  return () => prefetchFirstScreens(queryClient);
}

/** For the signed-in shell: the same, when it opens with a session already there (a reload). */
export function usePrefetchFirstScreens() {
  const queryClient = useQueryClient();
  useEffect(() => prefetchFirstScreens(queryClient), [queryClient]);
}
