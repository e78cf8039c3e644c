import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { colors, fonts, fontSize, radius, space } from "@/constants/theme";
import type { Me } from "@/lib/shop-settings";
import { authClient } from "@/lib/auth-client";

/** Who is signed in, in which shop and with which role; switch shop; sign out. */
export function ShopHeader({ me }: { me: Me }) {
  const [choosing, setChoosing] = useState(false);
  const queryClient = useQueryClient();
  const active = me.activeShop;

  async function switchTo(shopId: string) {
    setChoosing(false);
    await authClient.organization.setActive({ organizationId: shopId });
    await queryClient.invalidateQueries(); // every query belongs to the shop that was active
  }
  async function signOut() {
    await authClient.signOut();
    queryClient.clear();
  }

  return (
    <View style={styles.bar}>
      <View style={styles.row}>
        <View style={styles.who}>
          <Text style={styles.shop} numberOfLines={1} testID="active-shop">
            {active?.name ?? "No shop"}
          </Text>
          <Text style={styles.person} numberOfLines={1}>
            {me.user.name} ·{" "}
            <Text testID="active-role" style={styles.role}>
              {active?.role ?? "-"}
            </Text>
          </Text>
        </View>
        {me.shops.length > 1 ? (
          <Pressable role="button" onPress={() => setChoosing((c) => !c)} style={styles.action}>
            <Text style={styles.actionText}>Switch shop</Text>
          </Pressable>
        ) : null}
        <Pressable role="button" onPress={signOut} style={styles.action}>
          <Text style={styles.actionText}>Sign out</Text>
        </Pressable>
      </View>
      {choosing ? (
        <View style={styles.menu}>
          {me.shops.map((s) => (
            <Pressable key={s.id} role="button" onPress={() => switchTo(s.id)} style={styles.menuItem}>
              <Text style={[styles.menuText, s.id === active?.id && styles.current]}>
                {s.name} ({s.role})
              </Text>
            </Pressable>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  bar: {
    backgroundColor: colors.surface,
    borderBottomWidth: 1,
    borderBottomColor: colors.line,
    paddingHorizontal: space.lg,
    paddingVertical: space.sm,
  },
  row: { flexDirection: "row", alignItems: "center", gap: space.sm },
  who: { flex: 1, minWidth: 0 },
  shop: { fontFamily: fonts.heading, fontSize: fontSize.lead, color: colors.ink },
  person: { fontSize: fontSize.small, color: colors.muted },
  role: { color: colors.steel, fontWeight: "700" },
  action: {
    paddingHorizontal: space.sm,
    paddingVertical: space.sm,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.line,
  },
  actionText: { color: colors.accent, fontWeight: "600", fontSize: fontSize.detail },
  menu: { marginTop: space.sm, gap: space.xs },
  menuItem: { paddingVertical: space.sm },
  menuText: { fontSize: fontSize.body, color: colors.ink },
  current: { fontWeight: "700" },
});
