import { Link } from "expo-router";
import { useState } from "react";
import { StyleSheet, Text } from "react-native";
import { AuthCard } from "@/components/auth/auth-card";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize } from "@/constants/theme";
import { useFormErrors } from "@/hooks/use-form-errors";
import { authClient } from "@/lib/auth-client";
import { forgotPasswordForm } from "@/lib/people-schemas";

/** Asks for a reset link. The answer is the same whether or not the e-mail has an account. */
export default function ForgotPassword() {
  const [email, setEmail] = useState("");
  const [sentTo, setSentTo] = useState<string>();
  const [failure, setFailure] = useState<string>();
  const [busy, setBusy] = useState(false);
  const { errors, check } = useFormErrors(forgotPasswordForm);

  async function submit() {
    setFailure(undefined);
    const values = check({ email });
    if (!values) return;
    setBusy(true);
    const { error } = await authClient.requestPasswordReset({ email: values.email });
    setBusy(false);
    if (error)
      setFailure(
        error.status === 429
          ? "Too many requests; wait a minute and try again."
          : "The request could not be sent; try again.",
      );
    else setSentTo(values.email);
  }

  return (
    <AuthCard title="Forgot your password?">
      {sentTo ? (
        <Notice>
          <Text style={styles.text} testID="reset-sent">
            If {sentTo} has an account, a message with a link to set a new password is on its way. The link works once,
            for one hour.
          </Text>
        </Notice>
      ) : (
        <>
          <Text style={styles.text}>Enter your account's e-mail; we send a link to set a new password.</Text>
          {failure ? <Notice tone="error">{failure}</Notice> : null}
          <TextField
            label="E-mail"
            value={email}
            onChangeText={setEmail}
            error={errors.email}
            autoCapitalize="none"
            autoComplete="email"
            keyboardType="email-address"
            inputMode="email"
            onSubmitEditing={submit}
          />
          <Button label="Send the link" onPress={submit} busy={busy} />
        </>
      )}
      <Link href="/sign-in" style={styles.link}>
        Back to sign in
      </Link>
    </AuthCard>
  );
}

const styles = StyleSheet.create({
  text: { color: colors.ink, fontSize: fontSize.body, lineHeight: 22 },
  link: { color: colors.accent, fontWeight: "600", fontSize: fontSize.body },
});
