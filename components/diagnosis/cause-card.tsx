import { useState } from "react";
import { Pressable, StyleSheet, Text, View } from "react-native";
import { CauseRecordLine } from "@/components/rulebook/rule-record";
import { CheckBox } from "@/components/ui/check-box";
import { ScoreBar } from "@/components/ui/score-bar";
import { usePrinting } from "@/hooks/use-printing";
import { card, colors, fontSize, space } from "@/constants/theme";
import { fixesInUnits } from "@/lib/quantity-words";
import { reasonInUnits } from "@/lib/reason-text";
import type { CauseWithRecord } from "@/lib/review-schemas";
import type { Units } from "@/lib/units";

/** A ranked cause; `record` says how often it was right in this shop's confirmed cases. */
type Cause = CauseWithRecord;

type Props = {
  cause: Cause;
  rank: number;
  units: Units;
  /** The fixes ticked on this casting (kept with it); `onTick` is absent for those who may not tick. */
  ticked: ReadonlySet<string>;
  onTick?: (fix: string, ticked: boolean) => void;
};

/** One likely cause: how strongly it is pointed at, the fixes to try (tick the ones to try), and why. */
export function CauseCard({ cause, rank, units, ticked, onTick }: Props) {
  const [why, setWhy] = useState(false);
  // A tick is kept by the fix's own (SI) text, so it holds whichever units the person reads it in.
  const shown = fixesInUnits(cause, units);
  // On paper there is nothing to tap, so the reasons are always there.
  const printing = usePrinting();
  const open = why || printing;

  return (
    <View style={styles.card} testID={`cause-${rank}`}>
      <Text style={styles.title}>
        {rank}. {cause.title}
      </Text>
      <ScoreBar score={cause.score} />
      <CauseRecordLine cause={cause} />
      <Text style={styles.sub}>
        Fixes to try{" "}
        <Text style={styles.subNote}>
          {onTick ? "(tick the ones to try: they are kept with the casting and offered when you record a fix)" : ""}
        </Text>
      </Text>
      {cause.fixes.map((f, i) => (
        <CheckBox
          key={f}
          label={shown[i] ?? f}
          checked={ticked.has(f)}
          disabled={!onTick}
          onChange={(on) => onTick?.(f, on)}
          large
        />
      ))}
      <Pressable role="button" aria-expanded={why} onPress={() => setWhy((w) => !w)}>
        <Text style={styles.toggle}>{why ? "▾ Hide why" : "▸ Why this cause"}</Text>
      </Pressable>
      {open ? (
        <View style={styles.why}>
          {/* Older saved results carry only the SI sentences. */}
          {(cause.reasons ? cause.reasons.map((r) => reasonInUnits(r, units)) : cause.because).map((b) => (
            <Text key={b} style={styles.reason}>
              • {b}
            </Text>
          ))}
          <Text style={styles.sources}>Sources: {cause.sources.join("; ")}</Text>
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  card: { ...card, gap: space.sm, padding: space.md },
  title: { fontSize: fontSize.field, fontWeight: "700", color: colors.ink },
  sub: { fontSize: fontSize.small, fontWeight: "700", color: colors.muted, marginTop: space.xs },
  subNote: { fontWeight: "400" },
  toggle: { fontSize: fontSize.body, fontWeight: "600", color: colors.accent, paddingVertical: space.xs },
  why: { gap: space.xs, paddingLeft: space.sm, borderLeftWidth: 3, borderLeftColor: colors.line },
  reason: { fontSize: fontSize.detail, lineHeight: 21, color: colors.ink },
  sources: { fontSize: fontSize.small, lineHeight: 19, color: colors.muted, fontStyle: "italic" },
});
