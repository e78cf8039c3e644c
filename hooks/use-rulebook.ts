import { useMutation, useQuery, useQueryClient } from "@tanstack/react-query";
import { useMe } from "@/hooks/use-me";
import { request } from "@/lib/api";
import { roleCan, type Permission } from "@/lib/permissions";
import type { RuleDetail, RuleDraft } from "@/lib/rulebook-schemas";

export const rulebookKeys = {
  all: ["rulebook"] as const,
  list: ["rulebook", "list"] as const,
  rule: (id: string) => ["rulebook", "rule", id] as const,
};

/** Whether the signed-in person's role in the active shop allows this (the server checks again). */
export function useMay(permission: Permission): boolean {
  const role = useMe().data?.activeShop?.role;
  return !!role && roleCan(role, permission);
}

export function useRulebook() {
  return useQuery({ queryKey: rulebookKeys.list, queryFn: () => request("GET /rulebook", {}) });
}

export function useRule(id: string) {
  return useQuery({
    queryKey: rulebookKeys.rule(id),
    queryFn: () => request("GET /rulebook/rules/:ruleId", { params: { ruleId: id } }),
    enabled: !!id,
  });
}

/** Any change to a rule changes the list (status, records) and the rule's own page. */
function useRuleChange<T, R extends RuleDetail>(fn: (arg: T) => Promise<R>) {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: fn,
    onSuccess: async (rule) => {
      queryClient.setQueryData(rulebookKeys.rule(rule.id), rule);
      await queryClient.invalidateQueries({ queryKey: rulebookKeys.list });
    },
  });
}

/** Creates a draft (no id) or saves a new draft version of a shop rule. */
export function useSaveRule(id?: string) {
  return useRuleChange((draft: RuleDraft) =>
    id
      ? request("PUT /rulebook/rules/:ruleId", { params: { ruleId: id }, body: draft })
      : request("POST /rulebook/rules", { body: draft }),
  );
}

export function usePublishRule(id: string) {
  return useRuleChange(() => request("POST /rulebook/rules/:ruleId/publish", { params: { ruleId: id } }));
}

export function useRetireRule(id: string) {
  return useRuleChange(() => request("POST /rulebook/rules/:ruleId/retire", { params: { ruleId: id } }));
}

export function useSwitchRule(id: string) {
  return useRuleChange((off: boolean) =>
    request("PUT /rulebook/rules/:ruleId/switch", { params: { ruleId: id }, body: { off } }),
  );
}

/** Runs a draft on the shop's past cases; nothing is stored. */
export function useTryRule() {
  return useMutation({
    mutationFn: (body: { draft: RuleDraft; ruleId?: string }) => request("POST /rulebook/try", { body }),
  });
}
