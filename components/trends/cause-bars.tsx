import { Text, View } from "react-native";
import { Heading } from "@/components/ui/heading";
import type { CausePoint } from "@/lib/trends-schemas";
import { BarRow, styles as bar } from "./rate-bars";

/** The causes mentors confirmed most, as bars against the most confirmed; a rulebook cause opens its castings. */
export function CauseBars({
  points,
  hrefOf,
}: {
  points: CausePoint[];
  hrefOf: (causeId: string | null) => string | undefined;
}) {
  const most = Math.max(1, ...points.map((p) => p.castings));
  return (
    <View style={bar.wrap}>
      <Heading level={3}>Causes mentors confirmed</Heading>
      {points.length === 0 ? <Text style={bar.none}>No causes confirmed on castings in these filters.</Text> : null}
      {points.map((p) => {
        const href = hrefOf(p.causeId);
        return (
          <BarRow key={`${p.causeId}:${p.title}`} words={`${p.title}: ${p.castings} castings`} href={href} stacked>
            <Text style={[bar.label, href ? bar.link : null]}>{p.title}</Text>
            <View style={bar.row}>
              <View style={bar.track}>
                <View style={[bar.bar, { width: `${Math.round((p.castings / most) * 100)}%` }]} />
              </View>
              <Text style={bar.count}>
                {p.castings} {p.castings === 1 ? "casting" : "castings"}
              </Text>
            </View>
          </BarRow>
        );
      })}
    </View>
  );
}
