import type { DefectLocation, DefectType } from "../rules/case";

/**
 * The seven classes of the international atlas of casting defects (International Committee of
 * Foundry Technical Associations), as reproduced in ASM Handbook Vol. 15, "Common Defects in
 * Various Casting Processes" (docs/foundry-facts.md, [hb]).
 */
export const DEFECT_CLASSES = {
  A: "metallic projections",
  B: "cavities",
  C: "discontinuities",
  D: "defective surface",
  E: "incomplete casting",
  F: "incorrect dimensions or shape",
  G: "inclusions or structural anomalies",
} as const;
export type DefectClass = keyof typeof DEFECT_CLASSES;

/**
 * `checked` is true where foundry-facts.md's class table gives the class ([hb]); false where the
 * class is placed from memory of the atlas ([mem]) and is still to be checked against it.
 */
export type DefectInfo = { label: string; description: string; defectClass: DefectClass; checked: boolean };

export const DEFECTS: Record<DefectType, DefectInfo> = {
  misrun: {
    label: "Misrun",
    defectClass: "E",
    checked: true,
    description: "The metal froze before the mould was full, so part of the casting is missing.",
  },
  "cold-shut": {
    label: "Cold shut",
    defectClass: "C",
    checked: true,
    description: "Two streams of metal met too cold to fuse, leaving a seam with rounded edges.",
  },
  "gas-porosity": {
    label: "Gas porosity",
    defectClass: "B",
    checked: true,
    description: "Small round, smooth-walled holes from gas (mostly hydrogen) leaving the metal as it froze.",
  },
  blowhole: {
    label: "Blowhole",
    defectClass: "B",
    checked: true,
    description: "Larger smooth holes, often just under the skin, from gas pushed out of the mould, core or coating.",
  },
  shrinkage: {
    label: "Shrinkage",
    defectClass: "B",
    checked: true,
    description: "Rough, jagged holes where the metal shrank while freezing and no liquid metal fed it.",
  },
  "rounded-edges": {
    label: "Rounded edges",
    defectClass: "E",
    checked: true,
    description: "Edges and corners not filled out sharp; in lost foam, typically at the top of the casting.",
  },
  "dross-inclusion": {
    label: "Dross or oxide",
    defectClass: "G",
    checked: true,
    description: "Oxide skins or dross caught in the metal: dull films, streaks or lumps.",
  },
  "sand-inclusion": {
    label: "Sand or coating caught in",
    defectClass: "G",
    checked: true,
    description: "Grains or lumps of sand or coating trapped in the metal (class D where only on the surface).",
  },
  "hot-tear": {
    label: "Hot tear",
    defectClass: "C",
    checked: true,
    description: "A ragged, branching crack that opened while the metal was still partly liquid and held back.",
  },
  crack: {
    label: "Crack",
    defectClass: "C",
    checked: false,
    description: "A clean, fine break that opened after the metal was solid, from stress while cooling or handling.",
  },
  fold: {
    label: "Fold or lap",
    defectClass: "D",
    checked: true,
    description: "A wrinkle or lap on the surface where a metal front folded over itself or over foam residue.",
  },
  "carbon-residue": {
    label: "Foam residue",
    defectClass: "D",
    checked: true,
    description: "Dark, sooty or shiny flakes and patches left by decomposed foam (class G where trapped inside).",
  },
  "metal-penetration": {
    label: "Metal in the sand",
    defectClass: "D",
    checked: false,
    description: "Metal pushed between the sand grains, leaving a rough crust of sand fused to the casting.",
  },
  "rough-surface": {
    label: "Rough surface",
    defectClass: "D",
    checked: false,
    description: "A surface rougher than the pattern: coarse sand texture, pits or an orange-peel skin.",
  },
  "sand-collapse": {
    label: "Sand caved in",
    defectClass: "F",
    checked: false,
    description: "The mould or unbonded sand gave way during the pour, so the shape is wrong where it fell in.",
  },
  swell: {
    label: "Swell",
    defectClass: "A",
    checked: false,
    description: "The casting bulges where the mould wall yielded under the metal's pressure.",
  },
  warp: {
    label: "Warp",
    defectClass: "F",
    checked: false,
    description: "The casting bent or twisted out of shape while cooling or at shakeout.",
  },
  flash: {
    label: "Flash or fin",
    defectClass: "A",
    checked: false,
    description: "Thin fins of metal where it ran into a gap between mould halves or a crack in the mould.",
  },
  blister: {
    label: "Blister",
    defectClass: "B",
    checked: false,
    description: "A raised bump on the skin over a shallow gas pocket just beneath it.",
  },
  pinholes: {
    label: "Pinholes",
    defectClass: "B",
    checked: true,
    description:
      "Many small round holes, often just under the skin, from gas coming out of the metal or the mould face.",
  },
  sink: {
    label: "Sink",
    defectClass: "B",
    checked: false,
    description: "A shallow dip in the surface over a heavy section that drew in as it froze unfed.",
  },
  scab: {
    label: "Scab",
    defectClass: "D",
    checked: false,
    description: "A rough, raised patch of metal where a layer of the mould face lifted and metal ran behind it.",
  },
  "rat-tail": {
    label: "Rat tail",
    defectClass: "D",
    checked: false,
    description: "A thin, wandering groove or step in the surface where the expanding sand face buckled.",
  },
  buckle: {
    label: "Buckle",
    defectClass: "D",
    checked: false,
    description: "A long, shallow V-shaped depression in a flat surface from the sand face expanding and bowing.",
  },
  erosion: {
    label: "Erosion cut or wash",
    defectClass: "D",
    checked: false,
    description: "Extra metal where the stream washed sand away, usually near the gate; the sand turns up elsewhere.",
  },
  mismatch: {
    label: "Mismatch (shift)",
    defectClass: "F",
    checked: false,
    description: "The cope and drag halves of the casting are offset at the parting line.",
  },
  "core-shift": {
    label: "Core shift",
    defectClass: "F",
    checked: false,
    description: "A cored hole or wall is out of place: the core moved or floated during pouring.",
  },
  "run-out": {
    label: "Run-out",
    defectClass: "E",
    checked: false,
    description: "Metal leaked out of the mould through the parting line or a crack, leaving the casting short.",
  },
  leaker: {
    label: "Leaker",
    defectClass: "B",
    checked: false,
    description: "The casting does not hold pressure: a path of porosity runs through a wall.",
  },
  segregation: {
    label: "Segregation or sweat",
    defectClass: "G",
    checked: false,
    description: "Uneven composition: beads or a skin of low-melting phase (lead, tin) pressed out at the surface.",
  },
  "zinc-loss": {
    label: "Zinc loss",
    defectClass: "G",
    checked: false,
    description: "A brass that lost zinc to fume during melting: off colour, off composition, harder to pour.",
  },
};

export const LOCATION_LABELS: Record<DefectLocation, string> = {
  top: "top",
  bottom: "bottom",
  side: "side",
  corner: "corner",
  edge: "edge",
  "thin-section": "thin section",
  "thick-section": "thick section",
  "near-gate": "near the gate",
  "far-from-gate": "far from the gate",
  junction: "at a junction",
  "parting-line": "at the parting line",
  "around-core": "around a core",
  "glue-line": "along a glue line",
  surface: "on the surface",
  throughout: "throughout",
};

export const SEVERITY_LABELS: Record<1 | 2 | 3, string> = { 1: "slight", 2: "clear", 3: "severe" };

/** "Misrun (E, incomplete casting)": the label with its class, for pickers and lists. */
export const defectWithClass = (t: DefectType) =>
  `${DEFECTS[t].label} (${DEFECTS[t].defectClass}, ${DEFECT_CLASSES[DEFECTS[t].defectClass]})`;
