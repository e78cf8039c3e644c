import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api";
import type { ShopRole } from "@/lib/permissions";
import type { ShopSettingsInput } from "@/lib/shop-settings";

export type Shop = {
  id: string;
  name: string;
  role: ShopRole;
  defaultAlloy: string | null;
  defaultProcess: string | null;
  defaultTemperature: string | null;
  defaultLength: string | null;
  defaultMass: string | null;
};
export type ShopMemberRow = { userId: string; name: string; email: string; role: ShopRole };

export const shopKeys = { shop: ["shop"] as const, members: ["shop", "members"] as const };

export function useShop() {
  return useQuery({ queryKey: shopKeys.shop, queryFn: () => api<Shop>("/shops/current") });
}

export function useShopMembers() {
  return useQuery({
    queryKey: shopKeys.members,
    queryFn: () => api<{ members: ShopMemberRow[] }>("/shops/current/members").then((r) => r.members),
  });
}

export function useSaveShopSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (input: ShopSettingsInput) => api<Shop>("/shops/current/settings", { method: "PATCH", body: input }),
    onSuccess: (shop) => queryClient.setQueryData(shopKeys.shop, shop),
  });
}
