import { useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { ChoiceChips } from "@/components/ui/choice-chips";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize, space } from "@/constants/theme";
import { useFormErrors } from "@/hooks/use-form-errors";
import { useInvite } from "@/hooks/use-people";
import { ApiError } from "@/lib/api";
import { inviteInput } from "@/lib/people-schemas";
import { ROLE_CHOICES } from "@/lib/role-words";

/** The owner invites someone by e-mail with a role; the message carries a link to join. */
export function InviteForm() {
  const [email, setEmail] = useState("");
  const [role, setRole] = useState("caster");
  const [sent, setSent] = useState<string>();
  const { errors, setErrors, check } = useFormErrors(inviteInput);
  const invite = useInvite();

  function submit() {
    setSent(undefined);
    const values = check({ email, role });
    if (!values) return;
    invite.mutate(values, {
      onSuccess: () => {
        setSent(`Invitation sent to ${values.email}.`);
        setEmail("");
      },
      onError: (err) => err instanceof ApiError && setErrors(err.fields ?? {}),
    });
  }

  return (
    <View style={styles.box}>
      <TextField
        label="Invite by e-mail"
        value={email}
        onChangeText={setEmail}
        error={errors.email}
        autoCapitalize="none"
        keyboardType="email-address"
        inputMode="email"
        placeholder="name@example.com"
      />
      <ChoiceChips label="As" options={ROLE_CHOICES} value={role} onChange={setRole} />
      {errors.role ? <Text style={styles.error}>{errors.role}</Text> : null}
      {invite.error && !(invite.error instanceof ApiError && Object.keys(invite.error.fields).length) ? (
        <Notice tone="error">{invite.error.message}</Notice>
      ) : null}
      {sent ? <Notice>{sent}</Notice> : null}
      <Button label="Send invitation" onPress={submit} busy={invite.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: space.md },
  error: { color: colors.danger, fontSize: fontSize.detail },
});
