import { Link } from "expo-router";
import { useState } from "react";
import { StyleSheet, Text } from "react-native";
import { AuthCard } from "@/components/auth/auth-card";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize } from "@/constants/theme";
import { useStartFirstScreens } from "@/hooks/use-first-screens";
import { useFormErrors } from "@/hooks/use-form-errors";
import { authClient } from "@/lib/auth-client";
import { SIGN_IN_FAILED, signInForm } from "@/lib/auth-forms";

export default function SignIn() {
  const [email, setEmail] = useState("");
  const [password, setPassword] = useState("");
  const [failure, setFailure] = useState<string>();
  const [busy, setBusy] = useState(false);
  const { errors, check } = useFormErrors(signInForm);
  const startFirstScreens = useStartFirstScreens();

  async function submit() {
    setFailure(undefined);
    const values = check({ email, password });
    if (!values) return;
    setBusy(true);
    const { error } = await authClient.signIn.email(values);
    if (!error) startFirstScreens();
    setBusy(false);
    if (error) setFailure(error.status === 429 ? "Too many attempts; wait a minute and try again." : SIGN_IN_FAILED);
  }

  return (
    <AuthCard title="Sign in">
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
      />
      <TextField
        label="Password"
        value={password}
        onChangeText={setPassword}
        error={errors.password}
        secureTextEntry
        autoComplete="current-password"
        onSubmitEditing={submit}
      />
      <Button label="Sign in" onPress={submit} busy={busy} />
      <Link href="/forgot-password" style={styles.link}>
        Forgot your password?
      </Link>
      <Text style={styles.alt}>
        New here?{" "}
        <Link href="/sign-up" style={styles.link}>
          Create an account and a shop
        </Link>
      </Text>
    </AuthCard>
  );
}

const styles = StyleSheet.create({
  alt: { color: colors.muted, fontSize: fontSize.body },
  link: { color: colors.accent, fontWeight: "600" },
});
