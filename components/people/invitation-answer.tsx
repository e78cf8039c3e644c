import { PASSWORD_MIN } from "@/lib/auth-forms";
import { useQueryClient } from "@tanstack/react-query";
import { useRouter } from "expo-router";
import { useState } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { colors, fontSize, space } from "@/constants/theme";
import { useFormErrors } from "@/hooks/use-form-errors";
import { authClient } from "@/lib/auth-client";
import { SIGN_IN_FAILED } from "@/lib/auth-forms";
import { invitedSignUpForm, type InvitationView } from "@/lib/people-schemas";
import { ROLE_MEANS } from "@/lib/role-words";

type Mode = "new" | "existing";

/**
 * A pending invitation: the invited person joins, signing up or in first when needed. The e-mail
 * is fixed to the invited one; another signed-in account is told so and offered a sign-out.
 */
export function InvitationAnswer({ invitation: inv }: { invitation: InvitationView }) {
  const session = authClient.useSession();
  const router = useRouter();
  const queryClient = useQueryClient();
  const [mode, setMode] = useState<Mode>("new");
  const [name, setName] = useState("");
  const [password, setPassword] = useState("");
  const [failure, setFailure] = useState<string>();
  const [busy, setBusy] = useState(false);
  const { errors, check } = useFormErrors(invitedSignUpForm);
  const signedInEmail = session.data?.user.email;

  async function join() {
    const { error } = await authClient.organization.acceptInvitation({ invitationId: inv.id });
    if (error) {
      setBusy(false);
      setFailure(error.message ?? "The invitation could not be accepted; open the link again.");
      return;
    }
    await queryClient.invalidateQueries();
    router.replace("/");
  }

  async function signUpAndJoin() {
    setFailure(undefined);
    const values = check({ name, password });
    if (!values) return;
    setBusy(true);
    const { error } = await authClient.signUp.email({ name: values.name, email: inv.email, password: values.password });
    if (error) {
      setBusy(false);
      setFailure(error.message ?? "The account could not be made; try again.");
      return;
    }
    // Sign-up answers a taken address like a new one (its owner is sent a message instead), so
    // signing in with the new password is what shows the account is this one.
    const signedIn = await authClient.signIn.email({ email: inv.email, password: values.password });
    if (signedIn.error) {
      setBusy(false);
      if (signedIn.error.status === 429) return setFailure("Too many attempts; wait a minute and try again.");
      setMode("existing");
      setFailure(
        "This e-mail seems to have an account already (we have sent it a message): sign in with its password to join.",
      );
      return;
    }
    await join();
  }

  async function signInAndJoin() {
    setFailure(undefined);
    if (!password) return setFailure("Enter your password.");
    setBusy(true);
    const { error } = await authClient.signIn.email({ email: inv.email, password });
    if (error) {
      setBusy(false);
      setFailure(error.status === 429 ? "Too many attempts; wait a minute and try again." : SIGN_IN_FAILED);
      return;
    }
    await join();
  }

  const intro = (
    <Text style={styles.text}>
      {inv.inviterName} invites <Text style={styles.strong}>{inv.email}</Text> to join {inv.shopName} as{" "}
      <Text style={styles.strong} testID="invited-role">
        {inv.role}
      </Text>{" "}
      ({ROLE_MEANS[inv.role] ?? ""}).
    </Text>
  );

  if (session.isPending) return intro;
  if (signedInEmail && signedInEmail.toLowerCase() !== inv.email.toLowerCase()) {
    return (
      <>
        {intro}
        <Notice tone="caution">
          <Text style={styles.text} testID="wrong-account">
            You are signed in as {signedInEmail}, but this invitation is for {inv.email}. Sign out, then sign in or sign
            up as {inv.email} to join.
          </Text>
        </Notice>
        <Button kind="plain" label="Sign out" onPress={() => authClient.signOut()} />
      </>
    );
  }
  if (signedInEmail) {
    return (
      <>
        {intro}
        {failure ? <Notice tone="error">{failure}</Notice> : null}
        <Button
          label={`Join ${inv.shopName}`}
          busy={busy}
          onPress={() => {
            setBusy(true);
            void join();
          }}
        />
      </>
    );
  }
  return (
    <>
      {intro}
      {failure ? <Notice tone="error">{failure}</Notice> : null}
      <View style={styles.fixed}>
        <Text style={styles.label}>E-mail</Text>
        <Text style={styles.text}>{inv.email}</Text>
      </View>
      {mode === "new" ? (
        <>
          <TextField label="Your name" value={name} onChangeText={setName} error={errors.name} autoComplete="name" />
          <TextField
            label="Choose a password"
            value={password}
            onChangeText={setPassword}
            error={errors.password}
            secureTextEntry
            autoComplete="new-password"
            placeholder={`at least ${PASSWORD_MIN} characters`}
            onSubmitEditing={signUpAndJoin}
          />
          <Button label="Create account and join" onPress={signUpAndJoin} busy={busy} />
          <Button kind="plain" label="I already have an account" onPress={() => setMode("existing")} />
        </>
      ) : (
        <>
          <TextField
            label="Password"
            value={password}
            onChangeText={setPassword}
            secureTextEntry
            autoComplete="current-password"
            onSubmitEditing={signInAndJoin}
          />
          <Button label="Sign in and join" onPress={signInAndJoin} busy={busy} />
          <Button kind="plain" label="I am new here" onPress={() => setMode("new")} />
        </>
      )}
    </>
  );
}

const styles = StyleSheet.create({
  text: { fontSize: fontSize.body, lineHeight: 22, color: colors.ink },
  strong: { fontWeight: "600" },
  label: { fontSize: fontSize.detail, fontWeight: "600", color: colors.ink },
  fixed: { gap: space.xs },
});
