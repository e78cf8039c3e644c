import { useQueryClient } from "@tanstack/react-query";
import { useState } from "react";
import { z } from "zod";
import { Button } from "@/components/ui/button";
import { Heading } from "@/components/ui/heading";
import { Notice } from "@/components/ui/notice";
import { Screen } from "@/components/ui/screen";
import { TextField } from "@/components/ui/text-field";
import { meKey } from "@/hooks/use-me";
import { useFormErrors } from "@/hooks/use-form-errors";
import { createShop } from "@/lib/create-shop";

const form = z.object({ shopName: z.string().trim().min(2, "Name your shop (at least 2 characters)").max(80) });

/** For a signed-in person who belongs to no shop yet. */
export function CreateShopForm() {
  const [shopName, setShopName] = useState("");
  const [failure, setFailure] = useState<string>();
  const [busy, setBusy] = useState(false);
  const { errors, check } = useFormErrors(form);
  const queryClient = useQueryClient();

  async function submit() {
    const values = check({ shopName });
    if (!values) return;
    setBusy(true);
    const error = await createShop(values.shopName);
    setBusy(false);
    if (error) setFailure(error);
    else await queryClient.invalidateQueries({ queryKey: meKey });
  }

  return (
    <Screen>
      <Heading>Start a shop</Heading>
      <Notice>You do not belong to a shop yet. Start one (you will own it), or ask a shop owner to add you.</Notice>
      {failure ? <Notice tone="error">{failure}</Notice> : null}
      <TextField
        label="Shop name"
        value={shopName}
        onChangeText={setShopName}
        error={errors.shopName}
        onSubmitEditing={submit}
      />
      <Button label="Start the shop" onPress={submit} busy={busy} />
    </Screen>
  );
}
