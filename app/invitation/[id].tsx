import { useQuery } from "@tanstack/react-query";
import { Link, useLocalSearchParams } from "expo-router";
import { StyleSheet } from "react-native";
import { AuthCard } from "@/components/auth/auth-card";
import { InvitationAnswer } from "@/components/people/invitation-answer";
import { InvitationClosed } from "@/components/people/invitation-closed";
import { Loading } from "@/components/ui/query-state";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize } from "@/constants/theme";
import { request } from "@/lib/api";

/** Where an invitation link leads, signed in or not: join, or a plain word on why the link no longer works. */
export default function InvitationScreen() {
  const { id } = useLocalSearchParams<{ id: string }>();
  const view = useQuery({
    queryKey: ["invitation", id],
    queryFn: () => request("GET /people/invitations/:id/open", { params: { id } }),
    retry: false,
  });
  const inv = view.data;
  return (
    <AuthCard title={inv ? `Join ${inv.shopName}` : "Invitation"}>
      {view.isPending ? <Loading /> : null}
      {view.error ? (
        <>
          <Notice tone="error">{view.error.message}</Notice>
          <Link href="/" style={styles.link}>
            Go to Shakeout Casebook
          </Link>
        </>
      ) : null}
      {inv ? (
        inv.state === "pending" ? (
          <InvitationAnswer invitation={inv} />
        ) : (
          <InvitationClosed invitation={inv} />
        )
      ) : null}
    </AuthCard>
  );
}

const styles = StyleSheet.create({ link: { color: colors.accent, fontWeight: "600", fontSize: fontSize.body } });
