import { PASSWORD_MIN } from "@/lib/auth-forms";
import { useState } from "react";
import { StyleSheet, View } from "react-native";
import { Button } from "@/components/ui/button";
import { Notice } from "@/components/ui/notice";
import { TextField } from "@/components/ui/text-field";
import { space } from "@/constants/theme";
import { useFormErrors } from "@/hooks/use-form-errors";
import { useChangeName, useChangePassword } from "@/hooks/use-people";
import { ApiError } from "@/lib/api";
import { changePasswordInput, displayNameInput } from "@/lib/people-schemas";

/** The signed-in person's own name (as the shop sees it) and password. */
export function AccountForm({ name: currentName }: { name: string }) {
  const [name, setName] = useState(currentName);
  const [currentPassword, setCurrentPassword] = useState("");
  const [newPassword, setNewPassword] = useState("");
  const [done, setDone] = useState<string>();
  const nameErrors = useFormErrors(displayNameInput);
  const passwordErrors = useFormErrors(changePasswordInput);
  const changeName = useChangeName();
  const changePassword = useChangePassword();

  function saveName() {
    setDone(undefined);
    const values = nameErrors.check({ name });
    if (values) changeName.mutate(values.name, { onSuccess: () => setDone("Name saved.") });
  }
  function savePassword() {
    setDone(undefined);
    const values = passwordErrors.check({ currentPassword, newPassword });
    if (!values) return;
    changePassword.mutate(values, {
      onSuccess: () => {
        setCurrentPassword("");
        setNewPassword("");
        setDone("Password changed. Any other signed-in windows of yours are signed out.");
      },
      onError: (err) => err instanceof ApiError && passwordErrors.setErrors(err.fields ?? {}),
    });
  }

  // A refused field shows under its input; anything else (the server away, say) in a notice.
  const passwordFailure =
    changePassword.error instanceof ApiError && Object.keys(changePassword.error.fields).length
      ? null
      : changePassword.error;
  const failure = changeName.error ?? passwordFailure;
  return (
    <View style={styles.box}>
      {done ? <Notice>{done}</Notice> : null}
      {failure ? <Notice tone="error">{failure.message}</Notice> : null}
      <TextField label="Your name" value={name} onChangeText={setName} error={nameErrors.errors.name} maxLength={80} />
      <Button kind="plain" label="Save name" onPress={saveName} busy={changeName.isPending} />
      <TextField
        label="Current password"
        value={currentPassword}
        onChangeText={setCurrentPassword}
        error={passwordErrors.errors.currentPassword}
        secureTextEntry
        autoComplete="current-password"
      />
      <TextField
        label="New password"
        value={newPassword}
        onChangeText={setNewPassword}
        error={passwordErrors.errors.newPassword}
        secureTextEntry
        autoComplete="new-password"
        placeholder={`at least ${PASSWORD_MIN} characters`}
      />
      <Button kind="plain" label="Change password" onPress={savePassword} busy={changePassword.isPending} />
    </View>
  );
}

const styles = StyleSheet.create({ box: { gap: space.md } });
