import { useQuery } from "@tanstack/react-query";
import { api } from "@/lib/api";
import type { ShopRole } from "@/lib/permissions";

export type MyShop = { id: string; name: string; role: ShopRole };
export type Me = { user: { id: string; name: string; email: string }; shops: MyShop[]; activeShop: MyShop | null };

export const meKey = ["me"] as const;

export const meQuery = { queryKey: meKey, queryFn: () => api<Me>("/shops/me") };

/** The signed-in person, their shops and the active one (GET /api/shops/me). */
export function useMe(enabled = true) {
  return useQuery({ ...meQuery, enabled });
}
