import { useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, radius, space } from "@/constants/theme";
import { useChangeRole, useMakeOwner, useRemoveMember } from "@/hooks/use-people";
import type { ShopMemberRow } from "@/lib/shop-settings";
import type { ShopRole } from "@/lib/permissions";
import { ROLE_CHOICES } from "@/lib/role-words";

type Props = { members: ShopMemberRow[]; myUserId: string; canManage: boolean };

/** The shop's people; an owner can change a role, remove someone or hand ownership on. */
export function MemberList({ members, myUserId, canManage }: Props) {
  const [open, setOpen] = useState<string>();
  const changeRole = useChangeRole();
  const remove = useRemoveMember();
  const makeOwner = useMakeOwner();
  const failure = changeRole.error ?? remove.error ?? makeOwner.error;

  return (
    <View style={styles.list}>
      {failure ? <Notice tone="error">{failure.message}</Notice> : null}
      {members.map((m) => {
        const me = m.userId === myUserId;
        const editing = canManage && open === m.userId;
        return (
          <View key={m.userId} style={styles.person} testID="member-row">
            <View style={styles.head}>
              <View style={styles.words}>
                <Text style={styles.name}>
                  {m.name}
                  {me ? " (you)" : ""}
                </Text>
                <Text style={styles.meta}>
                  {m.email} · {m.role}
                </Text>
              </View>
              {canManage ? (
                <Button
                  kind="plain"
                  label={editing ? "Done" : "Change"}
                  onPress={() => setOpen(editing ? undefined : m.userId)}
                />
              ) : null}
            </View>
            {editing ? (
              <View style={styles.edit}>
                <ChoiceChips
                  label="Role"
                  options={ROLE_CHOICES}
                  value={m.role}
                  disabled={changeRole.isPending}
                  onChange={(role) => changeRole.mutate({ userId: m.userId, role: role as ShopRole })}
                />
                {me ? null : (
                  <View style={styles.actions}>
                    {m.role === "owner" ? null : (
                      <Button
                        kind="plain"
                        label="Hand ownership to them"
                        busy={makeOwner.isPending}
                        onPress={() => makeOwner.mutate(m.userId)}
                      />
                    )}
                    <Button
                      kind="plain"
                      label="Remove from shop"
                      busy={remove.isPending}
                      onPress={() => remove.mutate(m.userId, { onSuccess: () => setOpen(undefined) })}
                    />
                  </View>
                )}
              </View>
            ) : null}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  person: {
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.md,
    padding: space.md,
    gap: space.md,
  },
  head: { flexDirection: "row", alignItems: "center", gap: space.md },
  words: { flex: 1, gap: 2 },
  name: { fontSize: fontSize.field, fontWeight: "600", color: colors.ink },
  meta: { fontSize: fontSize.detail, color: colors.muted },
  edit: { gap: space.md },
  actions: { flexDirection: "row", flexWrap: "wrap", gap: space.sm },
});
