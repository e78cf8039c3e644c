import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { request } from "@/lib/api";
import { SI_UNITS, type Units } from "@/lib/units";

export const unitsKey = ["me", "units"] as const;

/** The person's units (GET /api/people/me/units). */
export const unitsQuery = {
  queryKey: unitsKey,
  queryFn: () => request("GET /people/me/units", {}),
  staleTime: 5 * 60_000,
};

export function useUnitsQuery() {
  return useQuery(unitsQuery);
}

/** The units to show values in: SI until the person's choice has loaded (values are stored SI). */
export function useUnits(): Units {
  return useUnitsQuery().data ?? SI_UNITS;
}

export function useSaveUnits() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (units: Units) => request("PUT /people/me/units", { body: units }),
    onSuccess: (units) => queryClient.setQueryData(unitsKey, units),
  });
}
