import { StyleSheet, Text } from "react-native";
import { Notice } from "@/components/notice";
import { colors } from "@/constants/theme";

/**
 * The usual cautions around melting and pouring. Sources: Aluminum Association safety guidance
 * (moisture and molten aluminium); supplier safety data sheets for argon and fluxes; common practice.
 */
export const GENERAL_CAUTIONS = [
  "Water or damp material under molten metal turns to steam at once and can throw metal: preheat tools, moulds and charge; never pour over concrete or wet ground.",
  "Wear a face shield, natural-fibre clothing, leather gloves and boots with trousers over them.",
  "Burning foam patterns and fluxes give off harmful fumes: pour with good ventilation.",
  "Argon has no smell and collects in low places such as pits: ventilate and do not degas in closed, low spaces.",
];

export function SafetyCautions() {
  return (
    <Notice tone="caution">
      {GENERAL_CAUTIONS.map((c) => (
        <Text key={c} style={styles.line}>• {c}</Text>
      ))}
      <Text style={styles.defer}>
        These are reminders, not a safety programme: follow local codes, the supplier's safety data sheets and trained practice.
      </Text>
    </Notice>
  );
}

const styles = StyleSheet.create({
  line: { fontSize: 14, lineHeight: 21, color: colors.ink },
  defer: { fontSize: 14, lineHeight: 21, color: colors.ink, fontStyle: "italic" },
});
