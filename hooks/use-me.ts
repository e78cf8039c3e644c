import { useQuery } from "@tanstack/react-query";
import { request } from "@/lib/api";

export const meKey = ["me"] as const;

export const meQuery = { queryKey: meKey, queryFn: () => request("GET /shops/me", {}) };

/** The signed-in person, their shops and the active one (GET /api/shops/me). */
export function useMe(enabled = true) {
  return useQuery({ ...meQuery, enabled });
}
