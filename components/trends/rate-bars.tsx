import { Link, type Href } from "expo-router";
import type { ReactNode } from "react";
import { StyleSheet, Text, View } from "react-native";
import { Heading } from "@/components/ui/heading";
import { colors, fontSize, radius, space } from "@/constants/theme";
import type { RatePoint } from "@/lib/trends-schemas";

/** Fewer castings than this in a group and its rate is shown as a count only: too few to compare. */
export const MIN_CASTINGS_FOR_RATE = 5;

type Props = {
  title: string;
  what: string;
  points: RatePoint[];
  /** The words for a bar's key (a process id as "green sand"). */
  labelOf?: (key: string) => string;
  /** Where a bar leads: the casebook listing the castings it counts. */
  hrefOf?: (key: string) => string | undefined;
};

/** A rate chart as horizontal bars, readable at 390 px; each bar says its counts in words for screen readers. */
export function RateBars({ title, what, points, labelOf = (k) => k, hrefOf }: Props) {
  return (
    <View style={styles.wrap}>
      <Heading level={3}>{title}</Heading>
      {points.length === 0 ? <Text style={styles.none}>No castings in these filters.</Text> : null}
      {points.map((p) => {
        const rate = p.castings ? p.count / p.castings : 0;
        const label = labelOf(p.key);
        const words = `${label}: ${p.count} of ${p.castings} castings ${what} (${Math.round(rate * 100)} %)`;
        return (
          <BarRow key={p.key} words={words} href={hrefOf?.(p.key)}>
            <Text style={[styles.key, hrefOf?.(p.key) ? styles.link : null]}>{label}</Text>
            <View style={styles.track}>
              <View style={[styles.bar, { width: `${Math.round(rate * 100)}%` }]} />
            </View>
            <Text style={styles.count}>
              {p.count}/{p.castings}
              {p.castings >= MIN_CASTINGS_FOR_RATE ? ` · ${Math.round(rate * 100)} %` : ""}
            </Text>
          </BarRow>
        );
      })}
    </View>
  );
}

/** One bar: a link to its castings when it has one, its counts in words either way. */
export function BarRow({
  words,
  href,
  stacked,
  children,
}: {
  words: string;
  href?: string;
  /** The label above the bar, for long labels (a fix, a cause). */
  stacked?: boolean;
  children: ReactNode;
}) {
  const style = stacked ? styles.stack : styles.row;
  if (!href)
    return (
      <View style={style} aria-label={words} role="img">
        {children}
      </View>
    );
  return (
    <Link href={href as Href} aria-label={`${words}. Open these castings`} style={styles.rowLink}>
      <View style={style}>{children}</View>
    </Link>
  );
}

export const styles = StyleSheet.create({
  wrap: { gap: space.sm },
  none: { color: colors.muted, fontSize: fontSize.detail },
  row: { flexDirection: "row", alignItems: "center", gap: space.sm, width: "100%" },
  stack: { gap: space.xs, width: "100%" },
  rowLink: { borderRadius: radius.sm },
  key: { width: 110, fontSize: fontSize.detail, color: colors.ink },
  label: { fontSize: fontSize.detail, color: colors.ink },
  link: { color: colors.accent, textDecorationLine: "underline" },
  track: {
    flex: 1,
    height: 16,
    flexDirection: "row",
    overflow: "hidden",
    backgroundColor: colors.surface,
    borderRadius: radius.sm,
    borderWidth: 1,
    borderColor: colors.line,
  },
  bar: { height: "100%", backgroundColor: colors.accent, borderRadius: radius.sm },
  count: { width: 82, fontSize: fontSize.detail, color: colors.ink, textAlign: "right" },
});
