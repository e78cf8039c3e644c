import AsyncStorage from "@react-native-async-storage/async-storage";
import { createAsyncStoragePersister } from "@tanstack/query-async-storage-persister";
import { persistQueryClient } from "@tanstack/react-query-persist-client";
import { useMutationState, type QueryClient } from "@tanstack/react-query";
import { useEffect } from "react";
import { request } from "@/lib/api";
import type { CastingInput, MeltInput } from "@/lib/notebook-schemas";

/**
 * Saves made without a connection wait on the device and go once it is back. New melts and castings
 * are TanStack Query mutations with these keys; their functions are set here as defaults, so a save
 * restored from storage after a reload knows how to send itself. Paused saves are written to the
 * device's storage (localStorage on web) per person; each carries an idempotency key, so the server
 * makes one row however often it is sent.
 */
export const SAVE_KEYS = { melt: ["melts", "create"], casting: ["castings", "create"] } as const;
export type CastingSave = { meltId: number; input: CastingInput };

export function setSaveDefaults(queryClient: QueryClient) {
  const refresh = () =>
    Promise.all([["melts"], ["castings"]].map((queryKey) => queryClient.invalidateQueries({ queryKey })));
  queryClient.setMutationDefaults(SAVE_KEYS.melt, {
    mutationFn: (input: MeltInput) => request("POST /melts", { body: input }),
    onSuccess: refresh,
  });
  queryClient.setMutationDefaults(SAVE_KEYS.casting, {
    mutationFn: ({ meltId, input }: CastingSave) =>
      request("POST /castings/melts/:id", { params: { id: meltId }, body: input }),
    onSuccess: refresh,
  });
}

/**
 * Keeps the signed-in person's waiting saves on the device, brings them back after a reload and sends
 * them when the connection is there. Another person signing in on the same device never sends them.
 * Only paused saves are written (TanStack's default); query results are not kept.
 */
export function usePersistedSaves(queryClient: QueryClient, userId: string | undefined) {
  useEffect(() => {
    if (!userId) return;
    queryClient.getMutationCache().clear();
    const persister = createAsyncStoragePersister({
      storage: AsyncStorage,
      key: `casebook:${userId}:waiting-saves`,
      throttleTime: 100,
    });
    const [stop, restored] = persistQueryClient({
      queryClient,
      persister,
      maxAge: 30 * 24 * 3600_000,
      dehydrateOptions: { shouldDehydrateQuery: () => false },
    });
    restored.then(() => queryClient.resumePausedMutations());
    return () => {
      stop();
      queryClient.getMutationCache().clear();
    };
  }, [queryClient, userId]);
}

/** What each kind of save sends: the variables of its mutation. */
type SaveVariables = { melt: MeltInput; casting: CastingSave };

/** The saves of one kind that wait for the connection, as the input each will send. */
export function useWaitingSaves<K extends keyof typeof SAVE_KEYS>(kind: K): SaveVariables[K][] {
  return useMutationState({
    filters: { mutationKey: SAVE_KEYS[kind], predicate: (m) => m.state.isPaused },
    // The key decides the mutation function (setSaveDefaults), and with it what its variables are.
    select: (m) => m.state.variables as SaveVariables[K],
  });
}
