import { createElement, useRef } from "react";
import { Platform, Pressable, StyleSheet, Text, TextInput, View } from "react-native";
import { printHidden } from "@/components/ui/print";
import { colors, fieldBox, fontSize, radius, space } from "@/constants/theme";
import { addDays, dayInWords, isCalendarDay, localDay } from "@/lib/dates";

type Props = {
  label: string;
  /** YYYY-MM-DD as typed (may be half typed). */
  value: string;
  onChange: (day: string) => void;
  error?: string;
  testID?: string;
};

/** The picker's range: no year 0 (PostgreSQL has none) and nothing past tomorrow (lib/notebook-schemas.ts). */
const FIRST_DAY = "0001-01-01";

/**
 * A day, typed as YYYY-MM-DD or picked from a calendar, with the day in words beside it to check.
 * On the web the calendar is the browser's own `<input type="date">` (a wheel on a phone, a month
 * grid on a computer), opened by the button; typing stays possible for a keyboard or an odd browser.
 * In the phone app the box is typed, and the words show what was typed.
 */
export function DateField({ label, value, onChange, error, testID }: Props) {
  const picker = useRef<HTMLInputElement | null>(null);
  const today = localDay();
  const words = dayInWords(value, today);
  const open = () => {
    const el = picker.current;
    if (!el) return;
    // showPicker is in every current browser; where it is missing or refused, focus the input, which
    // some browsers open on focus, and typing stays.
    try {
      if (typeof el.showPicker === "function") return el.showPicker();
    } catch {
      // (A browser that refuses to show it here.)
    }
    el.focus();
  };
  return (
    <View style={styles.wrap}>
      <Text style={styles.label}>{label}</Text>
      <View style={styles.row}>
        <TextInput
          aria-label={label}
          aria-invalid={!!error}
          value={value}
          onChangeText={onChange}
          placeholder="YYYY-MM-DD"
          placeholderTextColor={colors.muted}
          inputMode="numeric"
          autoCorrect={false}
          maxLength={10}
          style={[styles.input, error ? styles.inputError : null]}
          testID={testID}
        />
        {Platform.OS === "web" ? (
          <Pressable
            role="button"
            onPress={open}
            style={styles.button}
            aria-label={`Pick ${label.toLowerCase()} from a calendar`}
            {...printHidden}
          >
            <Text style={styles.buttonText}>Calendar</Text>
            {createElement("input", {
              ref: picker,
              type: "date",
              "aria-label": `${label}, from a calendar`,
              tabIndex: -1,
              min: FIRST_DAY,
              max: addDays(today, 1),
              value: isCalendarDay(value.trim()) ? value.trim() : "",
              onChange: (e: { target: { value: string } }) => e.target.value && onChange(e.target.value),
              style: hiddenPicker,
            })}
          </Pressable>
        ) : null}
      </View>
      {words ? (
        <Text style={styles.words} testID={testID ? `${testID}-words` : undefined}>
          {words}
        </Text>
      ) : null}
      {error ? (
        <Text role="alert" style={styles.error}>
          {error}
        </Text>
      ) : null}
    </View>
  );
}

/** Under the button, out of sight and out of the tab order: the button opens it. */
const hiddenPicker = {
  position: "absolute",
  left: 0,
  bottom: 0,
  width: 1,
  height: 1,
  opacity: 0,
  border: 0,
  padding: 0,
  pointerEvents: "none",
} as const;

const styles = StyleSheet.create({
  wrap: { gap: space.xs },
  label: { fontSize: fontSize.detail, fontWeight: "600", color: colors.ink },
  row: { flexDirection: "row", gap: space.sm, alignItems: "stretch" },
  input: { ...fieldBox, flex: 1, maxWidth: 200 },
  inputError: { borderColor: colors.danger },
  button: {
    minHeight: 44,
    paddingHorizontal: space.md,
    borderWidth: 1,
    borderColor: colors.line,
    borderRadius: radius.sm,
    justifyContent: "center",
    backgroundColor: colors.surface,
  },
  buttonText: { fontSize: fontSize.field, color: colors.accent, fontWeight: "600" },
  words: { fontSize: fontSize.detail, color: colors.steel },
  error: { color: colors.danger, fontSize: fontSize.detail },
});
