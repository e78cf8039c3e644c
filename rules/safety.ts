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
