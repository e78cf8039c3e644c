import { StyleSheet, Text } from "react-native";
import { BackLink } from "@/components/ui/back-link";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { LoadFailed, Loading } from "@/components/ui/query-state";
import { ReviewQueueItem } from "@/components/review/review-queue-item";
import { Screen } from "@/components/ui/screen";
import { useReviewQueue } from "@/hooks/use-review";
import { useMay } from "@/hooks/use-rulebook";
import { colors, fontSize } from "@/constants/theme";

/** Castings whose casters asked a mentor to look, oldest first: open one to confirm its cause. */
export default function ReviewQueueScreen() {
  const mayReview = useMay({ review: ["confirm"] });
  const queue = useReviewQueue(mayReview);
  if (!mayReview) {
    return (
      <Screen>
        <BackLink href="/rulebook" label="Rulebook" />
        <Notice>Only mentors and owners confirm causes. Ask for a review on a casting's page.</Notice>
      </Screen>
    );
  }
  if (queue.isPending) return <Loading />;
  if (queue.error) return <LoadFailed error={queue.error} />;
  return (
    <Screen>
      <BackLink href="/rulebook" label="Rulebook" />
      <Heading>Waiting for review</Heading>
      <Text style={styles.intro}>Oldest first. Open a casting to confirm its cause or name another.</Text>
      {queue.data.length === 0 ? <Notice>No casting is waiting for review.</Notice> : null}
      {queue.data.map((item) => (
        <ReviewQueueItem key={item.requestId} item={item} />
      ))}
    </Screen>
  );
}

const styles = StyleSheet.create({ intro: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink } });
