import { TabList, Tabs, TabSlot, TabTrigger } from "expo-router/ui";
import { memo } from "react";
import { ActivityIndicator, StyleSheet, View } from "react-native";
import { CreateShopForm } from "@/components/auth/create-shop-form";
import { NavButton } from "@/components/ui/nav-button";
import { printHidden } from "@/components/ui/print";
import { Notice } from "@/components/ui/notice";
import { ShopHeader } from "@/components/shops/shop-header";
import { colors } from "@/constants/theme";
import { useIsWide } from "@/hooks/use-layout";
import { usePrefetchFirstScreens } from "@/hooks/use-first-screens";
import { useMe } from "@/hooks/use-me";
import { useReviewQueue } from "@/hooks/use-review";
import { roleCan } from "@/lib/permissions";

const SECTIONS = [
  { name: "casebook", href: "/", label: "Casebook" },
  { name: "melts", href: "/melts", label: "Melts" },
  { name: "rulebook", href: "/rulebook", label: "Rulebook" },
  { name: "trends", href: "/trends", label: "Trends" },
  { name: "more", href: "/more", label: "More" },
] as const;

/** The signed-in shell: shop header, then a bottom bar on phones or a side rail on wide screens. */
export default function AppLayout() {
  const wide = useIsWide();
  const me = useMe();
  usePrefetchFirstScreens();
  // Mentors and owners see how many cases wait for review beside the Rulebook (where the queue is).
  const reviews = !!me.data?.activeShop && roleCan(me.data.activeShop.role, { review: ["confirm"] });
  const queue = useReviewQueue(reviews);
  const waiting = queue.data?.length;
  if (me.isPending) return <ActivityIndicator style={styles.fill} color={colors.accent} />;
  if (me.error) return <Notice tone="error">{me.error.message}</Notice>;
  if (!me.data.activeShop) return <CreateShopForm />;

  return (
    <View style={styles.fill}>
      <View {...printHidden}>
        <ShopHeader me={me.data} />
      </View>
      <SectionTabs wide={wide} waiting={waiting} />
    </View>
  );
}

/**
 * The sections and the slot that shows the open one. Memoised: every render of <Tabs> works out each
 * trigger's route from the whole route table (expo-router keeps none of it), and the shell renders
 * again on each answer about the person or the review queue.
 */
const SectionTabs = memo(function SectionTabs({ wide, waiting }: { wide: boolean; waiting: number | undefined }) {
  // TabList must be a direct child of Tabs, so it is built here rather than in a component.
  const nav = (
    <TabList style={wide ? styles.rail : styles.bar} {...printHidden}>
      {SECTIONS.map((s) => (
        <TabTrigger key={s.name} name={s.name} href={s.href} asChild>
          <NavButton
            label={s.label}
            wide={wide}
            count={s.name === "rulebook" ? waiting : undefined}
            countLabel={`${waiting ?? 0} waiting for review`}
          />
        </TabTrigger>
      ))}
    </TabList>
  );
  return (
    <Tabs style={[styles.fill, { flexDirection: wide ? "row" : "column" }]}>
      {wide ? nav : null}
      <TabSlot style={styles.fill} />
      {wide ? null : nav}
    </Tabs>
  );
});

const styles = StyleSheet.create({
  fill: { flex: 1, backgroundColor: colors.background },
  bar: { flexDirection: "row", backgroundColor: colors.surface, borderTopWidth: 1, borderTopColor: colors.line },
  rail: {
    flexDirection: "column",
    justifyContent: "flex-start",
    width: 200,
    paddingTop: 8,
    backgroundColor: colors.surface,
    borderRightWidth: 1,
    borderRightColor: colors.line,
  },
});
