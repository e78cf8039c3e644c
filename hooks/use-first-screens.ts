import { useQueryClient, type QueryClient } from "@tanstack/react-query";
import { useEffect } from "react";
import { meQuery } from "@/hooks/use-me";
import { FIRST_MELTS_PAGE, meltsQuery } from "@/hooks/use-melts";
import { reviewQueueQuery } from "@/hooks/use-review";
import { caseSearchQuery } from "@/hooks/use-search";
import { membersQuery } from "@/hooks/use-shop";
import { unitsQuery } from "@/hooks/use-units";
import { searchRequestFor, viewFromParams } from "@/lib/casebook-filters";
import { roleCan } from "@/lib/permissions";

/**
 * What the first screens need: the person and their shop (GET /api/shops/me, which the shell waits
 * for), their units, the first page of the pour log, and the casebook's first page with the shop's
 * people (the casebook is where the shell opens). Each answer waits in the query cache, so the shell,
 * the casebook and Melts draw with their content in one go instead of after another round trip.
 */
function prefetchFirstScreens(queryClient: QueryClient) {
  // The review queue's count sits in the section bar (for those who review): fetched as soon as the
  // person's role is known, so the bar is drawn once with it.
  void queryClient
    .fetchQuery(meQuery)
    .then((me) => {
      if (me.activeShop && roleCan(me.activeShop.role, { review: ["confirm"] }))
        return queryClient.prefetchQuery(reviewQueueQuery);
    })
    .catch(() => undefined); // the shell's own query shows what went wrong
  void queryClient.prefetchQuery(unitsQuery);
  void queryClient.prefetchInfiniteQuery(meltsQuery(FIRST_MELTS_PAGE));
  void queryClient.prefetchQuery(caseSearchQuery(searchRequestFor(viewFromParams({}))));
  void queryClient.prefetchQuery(membersQuery);
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
