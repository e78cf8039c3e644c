import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { castingKeys } from "@/hooks/use-castings";
import { rulebookKeys } from "@/hooks/use-rulebook";
import { request } from "@/lib/api";
import type { CaseReview, ConfirmationInput } from "@/lib/review-schemas";

export const reviewKeys = {
  queue: ["review", "queue"] as const,
  casting: (id: number) => ["review", "casting", id] as const,
  causes: (id: number) => ["review", "causes", id] as const,
};

/** Every cause of the shop's rulebook, with its fixes for this casting's metal. */
export function useCastingCauses(castingId: number) {
  return useQuery({
    queryKey: reviewKeys.causes(castingId),
    queryFn: () => request("GET /review/castings/:id/causes", { params: { id: castingId } }).then((r) => r.causes),
  });
}

export function useCaseReview(castingId: number) {
  return useQuery({
    queryKey: reviewKeys.casting(castingId),
    queryFn: () => request("GET /review/castings/:id", { params: { id: castingId } }),
  });
}

export const reviewQueueQuery = {
  queryKey: reviewKeys.queue,
  queryFn: () => request("GET /review/queue", {}).then((r) => r.items),
};

export function useReviewQueue(enabled = true) {
  return useQuery({ ...reviewQueueQuery, enabled });
}

/** Once the answer on a casting has been read, its "new answer" mark leaves the person's lists. */
export function useAnswerSeen(castingId: number) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: () => request("POST /review/castings/:id/seen", { params: { id: castingId } }),
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: castingKeys.all }),
        queryClient.invalidateQueries({ queryKey: ["melts"] }),
      ]),
  });
}

function useReviewChange<T>(
  castingId: number,
  fn: (arg: T) => Promise<CaseReview>,
  alsoStale: readonly (readonly unknown[])[] = [],
) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: async (review) => {
      queryClient.setQueryData(reviewKeys.casting(castingId), review);
      await Promise.all(
        [reviewKeys.queue, ...alsoStale].map((queryKey) => queryClient.invalidateQueries({ queryKey })),
      );
    },
  });
}

export function useAskReview(castingId: number) {
  return useReviewChange(castingId, (note?: string) =>
    request("POST /review/castings/:id/requests", { params: { id: castingId }, body: { note: note || undefined } }),
  );
}

/** A confirmed cause changes the shop's records, so the rulebook and the casting page go stale. */
export function useConfirmCause(castingId: number) {
  return useReviewChange(
    castingId,
    (input: ConfirmationInput) =>
      request("POST /review/castings/:id/confirmations", { params: { id: castingId }, body: input }),
    // A cause added from the form joins the rulebook's list of causes.
    [rulebookKeys.all, castingKeys.detail(castingId), ["review", "causes"]],
  );
}
