import { PASSWORD_MIN } from "@/lib/auth-forms";
import { Link, useLocalSearchParams } from "expo-router";
import { useState } from "react";
import { StyleSheet, Text } from "react-native";
import { AuthCard } from "@/components/auth/auth-card";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize } from "@/constants/theme";
import { useFormErrors } from "@/hooks/use-form-errors";
import { authClient } from "@/lib/auth-client";
import { resetPasswordForm } from "@/lib/people-schemas";

/** Where the reset link leads: a new password, once; then every session of the account ends. */
export default function ResetPassword() {
  const { token } = useLocalSearchParams<{ token?: string }>();
  const [newPassword, setNewPassword] = useState("");
  const [repeat, setRepeat] = useState("");
  const [done, setDone] = useState(false);
  const [failure, setFailure] = useState<string>();
  const [busy, setBusy] = useState(false);
  const { errors, check } = useFormErrors(resetPasswordForm);

  async function submit() {
    setFailure(undefined);
    const values = check({ newPassword, repeat });
    if (!values || !token) return;
    setBusy(true);
    const { error } = await authClient.resetPassword({ newPassword: values.newPassword, token });
    setBusy(false);
    if (error)
      setFailure("This link has already been used or has run out (links work once, for one hour). Ask for a new one.");
    else setDone(true);
  }

  return (
    <AuthCard title="Set a new password">
      {!token ? <Notice tone="error">This page needs the link from the message; open it from there.</Notice> : null}
      {done ? (
        <Notice>
          <Text style={styles.text} testID="reset-done">
            Your new password is set, and every window that was signed in to this account is signed out. Sign in with
            the new password.
          </Text>
        </Notice>
      ) : token ? (
        <>
          {failure ? <Notice tone="error">{failure}</Notice> : null}
          <TextField
            label="New password"
            value={newPassword}
            onChangeText={setNewPassword}
            error={errors.newPassword}
            secureTextEntry
            autoComplete="new-password"
            placeholder={`at least ${PASSWORD_MIN} characters`}
          />
          <TextField
            label="Repeat it"
            value={repeat}
            onChangeText={setRepeat}
            error={errors.repeat}
            secureTextEntry
            autoComplete="new-password"
            onSubmitEditing={submit}
          />
          <Button label="Set password" onPress={submit} busy={busy} />
        </>
      ) : null}
      {failure ? (
        <Link href="/forgot-password" style={styles.link}>
          Ask for a new link
        </Link>
      ) : null}
      <Link href="/sign-in" style={styles.link}>
        Sign in
      </Link>
    </AuthCard>
  );
}

const styles = StyleSheet.create({
  text: { color: colors.ink, fontSize: fontSize.body, lineHeight: 22 },
  link: { color: colors.accent, fontWeight: "600", fontSize: fontSize.body },
});
