import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { request } from "@/lib/api";
import type { ShopSettingsInput } from "@/lib/shop-settings";

export const shopKeys = { shop: ["shop"] as const, members: ["shop", "members"] as const };

export function useShop() {
  return useQuery({ queryKey: shopKeys.shop, queryFn: () => request("GET /shops/current", {}) });
}

export const membersQuery = {
  queryKey: shopKeys.members,
  queryFn: () => request("GET /shops/current/members", {}).then((r) => r.members),
};

export function useShopMembers() {
  return useQuery(membersQuery);
}

export function useSaveShopSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ShopSettingsInput) => request("PATCH /shops/current/settings", { body: input }),
    onSuccess: (shop) => queryClient.setQueryData(shopKeys.shop, shop),
  });
}
