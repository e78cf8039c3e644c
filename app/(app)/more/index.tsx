import { useQuery } from "@tanstack/react-query";
import { Link } from "expo-router";
import { ActivityIndicator, StyleSheet, Text } from "react-native";
import { AccountForm } from "@/components/people/account-form";
import { InviteForm } from "@/components/people/invite-form";
import { LeaveShop } from "@/components/people/leave-shop";
import { MemberChanges } from "@/components/people/member-changes";
import { MemberList } from "@/components/people/member-list";
import { NoticeChooser } from "@/components/people/notice-chooser";
import { PendingInvitations } from "@/components/people/pending-invitations";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { SafetyCautions } from "@/components/diagnosis/safety-cautions";
import { Screen } from "@/components/ui/screen";
import { ShopExport } from "@/components/export/shop-export";
import { ShopSettingsForm } from "@/components/shops/shop-settings-form";
import { UnitsChooser } from "@/components/people/units-chooser";
import { colors, fontSize, space } from "@/constants/theme";
import { useMe } from "@/hooks/use-me";
import { useShop, useShopMembers } from "@/hooks/use-shop";
import { request } from "@/lib/api";
import { roleCan } from "@/lib/permissions";

/** The shop itself: its people, your account and units, its defaults, and the standing cautions. */
export default function MoreScreen() {
  const shop = useShop();
  const me = useMe();
  const members = useShopMembers();
  const isOwner = !!shop.data && roleCan(shop.data.role, { invitation: ["create"] });
  // The development inbox exists only where the server says so (never in production).
  const inbox = useQuery({
    queryKey: ["people", "inbox", "available"],
    queryFn: () => request("GET /people/dev/inbox", {}).then(() => true),
    enabled: isOwner,
    retry: false,
  });
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
      {members.data && me.data ? (
        <MemberList members={members.data} myUserId={me.data.user.id} canManage={isOwner} />
      ) : null}
      {isOwner ? (
        <>
          <Heading level={3}>Invite someone</Heading>
          <InviteForm />
          <Heading level={3}>Invitations waiting</Heading>
          <PendingInvitations />
          <Heading level={3}>Changes to people</Heading>
          <MemberChanges />
          {inbox.data ? (
            <Link href="/more/inbox" style={styles.link}>
              <Text style={styles.linkText}>Development inbox: mail the local server caught →</Text>
            </Link>
          ) : null}
        </>
      ) : null}
      <LeaveShop shopName={shop.data.name} />
      <Heading level={2}>Your account</Heading>
      {me.data ? <AccountForm name={me.data.user.name} /> : null}
      <Heading level={2}>Your notices</Heading>
      <NoticeChooser mentor={roleCan(shop.data.role, { review: ["confirm"] })} />
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
          <Link href="/more/import" style={styles.link} testID="import-link">
            <Text style={styles.linkText}>Import an old pour log (CSV) →</Text>
          </Link>
        </>
      ) : null}
      <Heading level={2}>Safety</Heading>
      <SafetyCautions />
    </Screen>
  );
}

const styles = StyleSheet.create({
  meta: { fontSize: fontSize.detail, color: colors.muted },
  link: { alignSelf: "flex-start", paddingVertical: 4 },
  linkText: { color: colors.accent, fontSize: fontSize.body, fontWeight: "600" },
});
