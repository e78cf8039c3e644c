import { ActivityIndicator, StyleSheet, Text, View } from "react-native";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { SafetyCautions } from "@/components/diagnosis/safety-cautions";
import { Screen } from "@/components/ui/screen";
import { ShopExport } from "@/components/export/shop-export";
import { ShopSettingsForm } from "@/components/shops/shop-settings-form";
import { UnitsChooser } from "@/components/people/units-chooser";
import { colors, fontSize, space } from "@/constants/theme";
import { useShop, useShopMembers } from "@/hooks/use-shop";
import { roleCan } from "@/lib/permissions";

/** The shop itself: its people, your units, its defaults, and the standing cautions. */
export default function MoreScreen() {
  const shop = useShop();
  const members = useShopMembers();
  if (shop.isPending) return <ActivityIndicator color={colors.accent} style={{ marginTop: space.xl }} />;
  if (shop.error)
    return (
      <Screen>
        <Notice tone="error">{shop.error.message}</Notice>
      </Screen>
    );

  return (
    <Screen>
      <Heading>{shop.data.name}</Heading>
      <Heading level={2}>People</Heading>
      {members.error ? <Notice tone="error">{members.error.message}</Notice> : null}
      <View style={styles.list}>
        {members.data?.map((m) => (
          <View key={m.userId} style={styles.person}>
            <Text style={styles.name}>{m.name}</Text>
            <Text style={styles.meta}>
              {m.email} · {m.role}
            </Text>
          </View>
        ))}
      </View>
      <Heading level={2}>Your units</Heading>
      <Text style={styles.meta}>
        How you see and type temperatures, sizes and weights. Only for you; the shop's records stay the same.
      </Text>
      <UnitsChooser />
      <Heading level={2}>Shop defaults</Heading>
      <ShopSettingsForm shop={shop.data} />
      {roleCan(shop.data.role, { shop: ["export"] }) ? (
        <>
          <Heading level={2}>Shop records</Heading>
          <ShopExport />
        </>
      ) : null}
      <Heading level={2}>Safety</Heading>
      <SafetyCautions />
    </Screen>
  );
}

const styles = StyleSheet.create({
  list: { gap: space.sm },
  person: {
    backgroundColor: colors.surface,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: 8,
    padding: space.md,
  },
  name: { fontSize: fontSize.field, fontWeight: "600", color: colors.ink },
  meta: { fontSize: fontSize.detail, color: colors.muted },
});
