import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { api } from "@/lib/api";
import type { InviteInput, NoticeSettings } from "@/lib/people-schemas";
import type { ShopRole } from "@/lib/permissions";
import { meKey } from "./use-me";
import { shopKeys } from "./use-shop";

export type PendingInvitation = {
  id: string;
  email: string;
  role: ShopRole;
  expiresAt: string;
  createdAt: string;
  inviterName: string;
  expired: boolean;
};
export type MemberChange = {
  id: number;
  actorName: string;
  action: string;
  subjectEmail: string;
  detail: string | null;
  at: string;
};
export type CaughtMessage = { id: string; to: string[]; subject: string; date: string; text: string; links: string[] };

export const peopleKeys = {
  invitations: ["people", "invitations"] as const,
  changes: ["people", "changes"] as const,
  inbox: ["people", "inbox"] as const,
};

/** Owner-only lists (the server answers 403 to anyone else, so the screen asks only for owners). */
export function useInvitations(enabled: boolean) {
  return useQuery({
    queryKey: peopleKeys.invitations,
    queryFn: () => api<{ invitations: PendingInvitation[] }>("/people/invitations").then((r) => r.invitations),
    enabled,
  });
}

export function useMemberChanges(enabled: boolean) {
  return useQuery({
    queryKey: peopleKeys.changes,
    queryFn: () => api<{ changes: MemberChange[] }>("/people/changes").then((r) => r.changes),
    enabled,
  });
}

export function useInbox() {
  return useQuery({
    queryKey: peopleKeys.inbox,
    queryFn: () => api<{ messages: CaughtMessage[] }>("/people/dev/inbox").then((r) => r.messages),
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
  usePeopleMutation((input: InviteInput) => api("/people/invitations", { method: "POST", body: input }));
export const useResendInvitation = () =>
  usePeopleMutation((id: string) => api(`/people/invitations/${id}/resend`, { method: "POST" }));
export const useCancelInvitation = () =>
  usePeopleMutation((id: string) => api(`/people/invitations/${id}/cancel`, { method: "POST" }));
export const useChangeRole = () =>
  usePeopleMutation((v: { userId: string; role: ShopRole }) =>
    api(`/people/members/${v.userId}`, { method: "PATCH", body: { role: v.role } }),
  );
export const useRemoveMember = () =>
  usePeopleMutation((userId: string) => api(`/people/members/${userId}`, { method: "DELETE" }));
export const useMakeOwner = () =>
  usePeopleMutation((userId: string) => api(`/people/members/${userId}/make-owner`, { method: "POST" }));
export const useLeaveShop = () => usePeopleMutation(() => api("/people/leave", { method: "POST" }));

export const useChangeName = () =>
  usePeopleMutation((name: string) => api("/people/me", { method: "PATCH", body: { name } }));
export const useChangePassword = () =>
  useMutation({
    mutationFn: (v: { currentPassword: string; newPassword: string }) =>
      api("/people/me/password", { method: "POST", body: v }),
  });

const noticesKey = ["people", "notices"] as const;

export function useNoticeSettings() {
  return useQuery({ queryKey: noticesKey, queryFn: () => api<NoticeSettings>("/people/me/notices") });
}

export function useSaveNoticeSettings() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: (v: NoticeSettings) => api<NoticeSettings>("/people/me/notices", { method: "PUT", body: v }),
    onSuccess: (v) => queryClient.setQueryData(noticesKey, v),
  });
}
