import { useQueryClient } from "@tanstack/react-query";
import { Link } from "expo-router";
import { useState } from "react";
import { StyleSheet, Text } from "react-native";
import { AuthCard } from "@/components/auth/auth-card";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize } from "@/constants/theme";
import { useFormErrors } from "@/hooks/use-form-errors";
import { meKey } from "@/hooks/use-me";
import { authClient } from "@/lib/auth-client";
import { signUpForm } from "@/lib/auth-forms";
import { createShop } from "@/lib/create-shop";

/** A new person and their shop, which they own. */
export default function SignUp() {
  const [form, setForm] = useState({ name: "", email: "", password: "", shopName: "" });
  const [failure, setFailure] = useState<string>();
  const [busy, setBusy] = useState(false);
  const [taken, setTaken] = useState<string>();
  const { errors, check } = useFormErrors(signUpForm);
  const queryClient = useQueryClient();
  const set = (key: keyof typeof form) => (value: string) => setForm((f) => ({ ...f, [key]: value }));

  async function submit() {
    setFailure(undefined);
    setTaken(undefined);
    const values = check(form);
    if (!values) return;
    setBusy(true);
    const { error } = await authClient.signUp.email({
      name: values.name,
      email: values.email,
      password: values.password,
    });
    if (error) {
      setBusy(false);
      setFailure(error.message ?? "The account could not be created; try again.");
      return;
    }
    // Sign-up answers a new address and a taken one alike (its owner gets a message), so the
    // account is proven by signing in with it: that fails only where the address was taken.
    const signedIn = await authClient.signIn.email({ email: values.email, password: values.password });
    if (signedIn.error) {
      setBusy(false);
      if (signedIn.error.status === 429) setFailure("Too many attempts; wait a minute and try again.");
      else setTaken(values.email);
      return;
    }
    const shopError = await createShop(values.shopName);
    await queryClient.invalidateQueries({ queryKey: meKey });
    setBusy(false);
    if (shopError) setFailure(shopError);
  }

  return (
    <AuthCard title="Create an account">
      {failure ? <Notice tone="error">{failure}</Notice> : null}
      {taken ? <TakenAddress email={taken} /> : null}
      <TextField
        label="Your name"
        value={form.name}
        onChangeText={set("name")}
        error={errors.name}
        autoComplete="name"
      />
      <TextField
        label="E-mail"
        value={form.email}
        onChangeText={set("email")}
        error={errors.email}
        autoCapitalize="none"
        autoComplete="email"
        keyboardType="email-address"
        inputMode="email"
      />
      <TextField
        label="Password"
        value={form.password}
        onChangeText={set("password")}
        error={errors.password}
        secureTextEntry
        autoComplete="new-password"
        placeholder="at least 10 characters"
      />
      <TextField
        label="Shop name"
        value={form.shopName}
        onChangeText={set("shopName")}
        error={errors.shopName}
        placeholder="the foundry, lab or club you cast with"
        onSubmitEditing={submit}
      />
      <Text style={styles.note}>You will own this shop: its casebook, its rules and who may use them.</Text>
      <Button label="Create account" onPress={submit} busy={busy} />
      <Text style={styles.alt}>
        Have an account?{" "}
        <Link href="/sign-in" style={styles.link}>
          Sign in
        </Link>
      </Text>
    </AuthCard>
  );
}

/** What a person reads when the address already had an account: the same words whoever typed it. */
function TakenAddress({ email }: { email: string }) {
  return (
    <Notice tone="note">
      <Text testID="sign-up-check-mail" style={styles.notice}>
        {`If ${email} already has an account, we have sent it a message. Check that mailbox, then `}
        <Link href="/sign-in" style={styles.link}>
          sign in
        </Link>
        {" with its password or "}
        <Link href="/forgot-password" style={styles.link}>
          set a new password
        </Link>
        .
      </Text>
    </Notice>
  );
}

const styles = StyleSheet.create({
  note: { color: colors.muted, fontSize: fontSize.detail },
  notice: { color: colors.ink, fontSize: fontSize.body, lineHeight: 22 },
  alt: { color: colors.muted, fontSize: fontSize.body },
  link: { color: colors.accent, fontWeight: "600" },
});
