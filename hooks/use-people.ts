import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { request } from "@/lib/api";
import type { ChangePasswordInput, InviteInput, NoticeSettings } from "@/lib/people-schemas";
import type { ShopRole } from "@/lib/permissions";
import { meKey } from "./use-me";
import { shopKeys } from "./use-shop";

export const peopleKeys = {
  invitations: ["people", "invitations"] as const,
  changes: ["people", "changes"] as const,
  inbox: ["people", "inbox"] as const,
};

/** Owner-only lists (the server answers 403 to anyone else, so the screen asks only for owners). */
export function useInvitations(enabled: boolean) {
  return useQuery({
    queryKey: peopleKeys.invitations,
    queryFn: () => request("GET /people/invitations", {}).then((r) => r.invitations),
    enabled,
  });
}

export function useMemberChanges(enabled: boolean) {
  return useQuery({
    queryKey: peopleKeys.changes,
    queryFn: () => request("GET /people/changes", {}).then((r) => r.changes),
    enabled,
  });
}

export function useInbox() {
  return useQuery({
    queryKey: peopleKeys.inbox,
    queryFn: () => request("GET /people/dev/inbox", {}).then((r) => r.messages),
    refetchInterval: 5000,
  });
}

/** Any change to people refreshes the member list, the invitations and the record of changes. */
function usePeopleMutation<V>(fn: (v: V) => Promise<unknown>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: () =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: shopKeys.members }),
        queryClient.invalidateQueries({ queryKey: ["people"] }),
        queryClient.invalidateQueries({ queryKey: meKey }),
        queryClient.invalidateQueries({ queryKey: shopKeys.shop }),
      ]),
  });
}

export const useInvite = () =>
  usePeopleMutation((input: InviteInput) => request("POST /people/invitations", { body: input }));
export const useResendInvitation = () =>
  usePeopleMutation((id: string) => request("POST /people/invitations/:id/resend", { params: { id } }));
export const useCancelInvitation = () =>
  usePeopleMutation((id: string) => request("POST /people/invitations/:id/cancel", { params: { id } }));
export const useChangeRole = () =>
  usePeopleMutation((v: { userId: string; role: ShopRole }) =>
    request("PATCH /people/members/:userId", { params: { userId: v.userId }, body: { role: v.role } }),
  );
export const useRemoveMember = () =>
  usePeopleMutation((userId: string) => request("DELETE /people/members/:userId", { params: { userId } }));
export const useMakeOwner = () =>
  usePeopleMutation((userId: string) => request("POST /people/members/:userId/make-owner", { params: { userId } }));
export const useLeaveShop = () => usePeopleMutation(() => request("POST /people/leave", {}));

export const useChangeName = () => usePeopleMutation((name: string) => request("PATCH /people/me", { body: { name } }));
export const useChangePassword = () =>
  useMutation({
    mutationFn: (v: ChangePasswordInput) => request("POST /people/me/password", { body: v }),
  });

const noticesKey = ["people", "notices"] as const;

export function useNoticeSettings() {
  return useQuery({ queryKey: noticesKey, queryFn: () => request("GET /people/me/notices", {}) });
}

export function useSaveNoticeSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (v: NoticeSettings) => request("PUT /people/me/notices", { body: v }),
    onSuccess: (v) => queryClient.setQueryData(noticesKey, v),
  });
}
