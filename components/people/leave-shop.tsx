import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { colors, fontSize, space } from "@/constants/theme";
import { useLeaveShop } from "@/hooks/use-people";

/** Leaving takes a second tap: the person loses the shop's casebook until invited again. */
export function LeaveShop({ shopName }: { shopName: string }) {
  const [asking, setAsking] = useState(false);
  const leave = useLeaveShop();
  const queryClient = useQueryClient();
  return (
    <View style={styles.box}>
      {leave.error ? <Notice tone="error">{leave.error.message}</Notice> : null}
      {asking ? (
        <>
          <Text style={styles.text}>
            Leave {shopName}? You will no longer see its casebook unless an owner invites you again.
          </Text>
          <View style={styles.row}>
            <Button
              label="Yes, leave"
              busy={leave.isPending}
              onPress={() => leave.mutate(undefined, { onSuccess: () => queryClient.invalidateQueries() })}
            />
            <Button kind="plain" label="Stay" onPress={() => setAsking(false)} />
          </View>
        </>
      ) : (
        <Button kind="plain" label="Leave this shop" onPress={() => setAsking(true)} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.sm, alignItems: "flex-start" },
  row: { flexDirection: "row", gap: space.sm },
  text: { fontSize: fontSize.body, color: colors.ink },
});
