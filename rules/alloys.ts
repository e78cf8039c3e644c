import type { AlloyFamily } from "./fact-catalog";

/**
 * Built-in casting alloys. Data only (plus the lookup): this list also seeds the alloy table, where a
 * shop may add its own. Every figure's source is in `sources`, tagged as in
 * docs/foundry-facts.md: [std] standard, [hb] handbook, [web] secondary web source to be
 * confirmed, [mem] recalled from memory and not yet checked against a document.
 */
export type AlloySpec = {
  designation: string;
  family: AlloyFamily;
  solidusC: number;
  liquidusC: number;
  densityKgM3: number;
  /** Pattern shrink allowance, % of the casting's size. */
  shrinkAllowancePct: number;
  /** Nominal silicon, wt % (aluminium alloys; lowers hydrogen solubility). */
  siliconPct?: number;
  /** Usual pour range for light and heavy sections, °C (copper-base and iron; per alloy). */
  pourLightC?: readonly [number, number];
  pourHeavyC?: readonly [number, number];
  /** Holds lead (leaded brasses and bronzes): lead fume, and lead sweat in heavy sections. */
  leaded?: boolean;
  /** Other names people write for it ("gray-iron", "85-5-5-5"). */
  aliases?: readonly string[];
  sources: string;
};

const AL_SHRINK = "shrink 1.30 % (5/32 in/ft) [web] patternmakers' shrink-rule charts";
const CU_SHRINK = "shrink 1.56 % (3/16 in/ft) [web] patternmakers' shrink-rule charts";
const BRONZE_SHRINK = "shrink about 2 % (7/32-1/4 in/ft) [mem]: aluminium and manganese bronzes shrink more than brass";
/** The copper industry's table, as docs/gating-and-copper-facts.md names it. */
const CDA_TABLE =
  'pour ranges for light and heavy sections: CDA/NFFS "Copper Casting Alloys", pouring-temperature table [mem] (docs/gating-and-copper-facts.md "Copper casting alloys")';

type AlInput = [string, AlloyFamily, number, number, number, number | undefined, string, number?];
/** designation, family, solidus, liquidus, density kg/m³, Si %, sources, shrink % */
const aluminium = ([
  designation,
  family,
  solidusC,
  liquidusC,
  densityKgM3,
  siliconPct,
  sources,
  shrink,
]: AlInput): AlloySpec => ({
  designation,
  family,
  solidusC,
  liquidusC,
  densityKgM3,
  shrinkAllowancePct: shrink ?? 1.3,
  ...(siliconPct === undefined ? {} : { siliconPct }),
  sources: `${sources}; ${shrink === undefined ? AL_SHRINK : `shrink ${shrink} % [web] alloy data pages`}`,
});

type CuInput = [
  string,
  AlloyFamily,
  number,
  number,
  number,
  [number, number],
  [number, number],
  number,
  string,
  string[]?,
];
/** designation, family, solidus, liquidus, density, light-section pour, heavy-section pour, shrink %, what it is */
const copper = ([
  designation,
  family,
  solidusC,
  liquidusC,
  densityKgM3,
  light,
  heavy,
  shrink,
  what,
  aliases,
]: CuInput): AlloySpec => ({
  designation,
  family,
  solidusC,
  liquidusC,
  densityKgM3,
  shrinkAllowancePct: shrink,
  pourLightC: light,
  pourHeavyC: heavy,
  ...(aliases ? { aliases } : {}),
  ...(/lead/i.test(what) ? { leaded: true } : {}),
  sources: `${what}; solidus/liquidus and density [web] stockist pages reproducing Copper Development Association data ([mem] where not found); ${CDA_TABLE}; ${shrink >= 1.8 ? BRONZE_SHRINK : CU_SHRINK}`,
});

export const BUILT_IN_ALLOYS: readonly AlloySpec[] = [
  {
    designation: "A356.0",
    family: "al-si",
    solidusC: 555,
    liquidusC: 615,
    densityKgM3: 2685,
    shrinkAllowancePct: 1.3,
    siliconPct: 7,
    sources: `solidus/liquidus [mem] ASM Handbook Vol. 2 ([web] alloy data pages give 557-613 °C); density [web]; ${AL_SHRINK}; Si 7 % nominal [mem]`,
  },
  {
    designation: "356.0",
    family: "al-si",
    solidusC: 555,
    liquidusC: 615,
    densityKgM3: 2685,
    shrinkAllowancePct: 1.3,
    siliconPct: 7,
    sources: `solidus/liquidus [mem] ASM Handbook Vol. 2 ([web] alloy data pages give 557-613 °C); density [web]; ${AL_SHRINK}; Si 7 % nominal [mem]`,
  },
  {
    designation: "319.0",
    family: "al-si-cu",
    solidusC: 520,
    liquidusC: 605,
    densityKgM3: 2800,
    shrinkAllowancePct: 1.3,
    siliconPct: 6,
    sources: `solidus/liquidus [mem] ASM Handbook Vol. 2 ([web] 516-604 °C); density [web]; ${AL_SHRINK}; Si 6 % nominal [mem]`,
  },
  {
    designation: "355.0",
    family: "al-si-cu",
    solidusC: 550,
    liquidusC: 620,
    densityKgM3: 2710,
    shrinkAllowancePct: 1.3,
    siliconPct: 5,
    sources: `solidus/liquidus [mem] ASM Handbook Vol. 2 ([web] 537-620 °C, LM16); density [mem]; ${AL_SHRINK}; Si 5 % nominal [mem]`,
  },
  {
    designation: "413.0",
    family: "al-si",
    solidusC: 575,
    liquidusC: 585,
    densityKgM3: 2660,
    shrinkAllowancePct: 1.3,
    siliconPct: 12,
    sources: `solidus/liquidus [mem] ASM Handbook Vol. 2 ([web] 574-582 °C), near eutectic; density [mem]; ${AL_SHRINK}; Si 12 % nominal [mem]`,
  },
  {
    designation: "443.0",
    family: "al-si",
    solidusC: 575,
    liquidusC: 630,
    densityKgM3: 2690,
    shrinkAllowancePct: 1.3,
    siliconPct: 5.25,
    sources: `solidus/liquidus [mem] ASM Handbook Vol. 2 ([web] 580-630 °C); density [hb] NADCA; ${AL_SHRINK}; Si 5.25 % nominal [mem]`,
  },
  {
    designation: "535.0",
    family: "al-mg",
    solidusC: 549,
    liquidusC: 629,
    densityKgM3: 2620,
    shrinkAllowancePct: 1.0,
    sources: `solidus/liquidus 549-629 °C and density [web] Almag 35 sheet; shrink 1.0 % (0.120 in/ft) [web]; Si only an impurity`,
  },
  {
    designation: "713.0",
    family: "al-zn",
    solidusC: 593,
    liquidusC: 638,
    densityKgM3: 2770,
    shrinkAllowancePct: 1.3,
    sources: `solidus/liquidus and density (0.100 lb/in³) [web] St. Paul Foundry 713.0 sheet; ${AL_SHRINK}; Si only an impurity`,
  },
  {
    designation: "A206.0",
    family: "al-cu",
    solidusC: 570,
    liquidusC: 650,
    densityKgM3: 2800,
    shrinkAllowancePct: 1.3,
    sources: `solidus/liquidus [mem] ([web] 550-670 °C); density [mem]; ${AL_SHRINK}; Si only an impurity, and Si contamination spoils it [web] Metal Casting Design & Purchasing (2016)`,
  },
  ...(
    [
      [
        "206.0",
        "al-cu",
        570,
        650,
        2800,
        undefined,
        "solidus/liquidus [mem]; density [mem]; fair hot-tear resistance only [web] Metal Casting Design & Purchasing (2016)",
      ],
      [
        "208.0",
        "al-si-cu",
        520,
        630,
        2790,
        3,
        "Al-4Cu-3Si; solidus/liquidus and density [mem] ASM Handbook Vol. 2; Si 3 % nominal [mem]",
      ],
      [
        "242.0",
        "al-cu",
        532,
        635,
        2810,
        undefined,
        "solidus/liquidus 990-1175 °F [web] St. Paul Foundry sheet; density [mem]",
      ],
      [
        "295.0",
        "al-cu",
        530,
        640,
        2810,
        1.1,
        "solidus/liquidus [web] makeitfrom; density [mem]; Si 1.1 % nominal [mem]",
      ],
      [
        "380.0",
        "al-si-cu",
        540,
        595,
        2740,
        8.5,
        "die-casting alloy, the usual die-cast scrap; solidus/liquidus 1000-1100 °F and density [hb] NADCA alloy data; Si 8.5 % nominal [mem]",
      ],
      [
        "514.0",
        "al-mg",
        580,
        642,
        2650,
        undefined,
        "Al-4Mg; solidus/liquidus [web] (LM5, BS/ANSI table); density [mem]",
      ],
      [
        "520.0",
        "al-mg",
        450,
        600,
        2570,
        undefined,
        "Al-10Mg; solidus/liquidus [mem] ASM ([web] 445-597 °C, LM10); density [mem]",
      ],
      ["771.0", "al-zn", 620, 630, 2800, undefined, "solidus/liquidus [web] wbcastings.com; density [mem]", 1.6],
    ] as AlInput[]
  ).map(aluminium),
  {
    designation: "6061",
    family: "al-wrought",
    solidusC: 582,
    liquidusC: 652,
    densityKgM3: 2700,
    shrinkAllowancePct: 1.3,
    siliconPct: 0.6,
    sources: `wrought alloy, common scrap; solidus/liquidus [web], agrees with ASM [mem]; density [web]; ${AL_SHRINK}; Si 0.6 % nominal [mem]`,
  },
  ...(
    [
      [
        "C83600",
        "red-brass",
        854,
        1010,
        8800,
        [1150, 1290],
        [1090, 1200],
        1.56,
        "leaded red brass 85-5-5-5",
        ["85-5-5-5", "red-brass"],
      ],
      ["C84400", "red-brass", 843, 1004, 8690, [1150, 1260], [1065, 1175], 1.56, "leaded semi-red brass"],
      [
        "C85700",
        "yellow-brass",
        913,
        941,
        8470,
        [1040, 1150],
        [950, 1065],
        1.56,
        "leaded yellow brass",
        ["yellow-brass"],
      ],
      [
        "C86500",
        "manganese-bronze",
        862,
        880,
        8330,
        [1040, 1100],
        [980, 1040],
        2.0,
        "manganese bronze (high-strength yellow brass)",
        ["manganese-bronze"],
      ],
      [
        "C87300",
        "silicon-bronze",
        866,
        977,
        8360,
        [1093, 1177],
        [1010, 1066],
        1.56,
        "silicon bronze 95-4-1 (pours [web] from an ingot sheet)",
        ["silicon-bronze"],
      ],
      [
        "C87600",
        "silicon-bronze",
        860,
        971,
        8300,
        [1093, 1177],
        [1010, 1066],
        1.56,
        "silicon bronze, pours as C87300 [mem]",
      ],
      ["C90300", "tin-bronze", 854, 1000, 8800, [1150, 1260], [1040, 1150], 1.56, "tin bronze 88-8-0-4"],
      [
        "C90500",
        "tin-bronze",
        854,
        1000,
        8720,
        [1150, 1260],
        [1040, 1150],
        1.56,
        "tin bronze 88-10-0-2",
        ["tin-bronze", "gun-metal"],
      ],
      ["C92200", "tin-bronze", 826, 988, 8640, [1150, 1260], [1040, 1150], 1.56, "leaded tin bronze, Navy M"],
      [
        "C93200",
        "tin-bronze",
        854,
        977,
        8910,
        [1100, 1230],
        [1010, 1120],
        1.56,
        "high-leaded tin bronze (bearing bronze)",
        ["bearing-bronze"],
      ],
      [
        "C95400",
        "aluminium-bronze",
        1027,
        1038,
        7450,
        [1150, 1230],
        [1090, 1175],
        2.0,
        "aluminium bronze",
        ["aluminium-bronze", "aluminum-bronze"],
      ],
      ["C95800", "aluminium-bronze", 1043, 1060, 7640, [1175, 1260], [1120, 1200], 2.0, "nickel-aluminium bronze"],
    ] as CuInput[]
  ).map(copper),
  {
    designation: "gray-iron",
    family: "gray-iron",
    // C 3.3, Si 2.0, P 0.05: CEL 3.78, liquidus 1625 - 110 CEL ≈ 1210 °C [hb] Koriyama et al. (2020); eutectic ≈ 1150 °C [mem].
    solidusC: 1150,
    liquidusC: 1210,
    densityKgM3: 7150,
    shrinkAllowancePct: 1.04,
    pourLightC: [1400, 1450],
    pourHeavyC: [1300, 1370],
    aliases: ["grey-iron", "class-30", "class-35", "class-40", "en-gjl-250", "gjl-250", "en-gjl-200", "cast-iron"],
    sources:
      'typical C 3.3, Si 2.0, P 0.05 [mem]; liquidus 1210 °C from TL = 1625 - 110 CEL [hb] Koriyama, Kanno, Iwami and Kang (2020); eutectic ≈ 1150 °C [mem]; density [mem]; pour: thin (< 10 mm) 1400-1450 °C, heavy (> 50 mm) 1300-1370 °C [mem]; shrink 1.04 % (1/8 in/ft) [web] (docs/gating-and-copper-facts.md "Iron")',
  },
  {
    designation: "ductile-iron",
    family: "ductile-iron",
    // C 3.6, Si 2.5: CEL 4.18, liquidus ≈ 1165 °C by the same fit (near eutectic) [calc].
    solidusC: 1145,
    liquidusC: 1165,
    densityKgM3: 7100,
    shrinkAllowancePct: 0.6,
    pourLightC: [1400, 1450],
    pourHeavyC: [1320, 1380],
    aliases: [
      "nodular-iron",
      "sg-iron",
      "65-45-12",
      "60-40-18",
      "80-55-06",
      "en-gjs-400-15",
      "gjs-400",
      "en-gjs-500-7",
    ],
    sources:
      'typical C 3.6, Si 2.5 [mem]; liquidus from TL = 1625 - 110 CEL [hb] Koriyama et al. (2020); density [mem]; pour ranges [mem], as gray iron; shrink 0-1 % by section and mould rigidity [mem]; Mg 0.035-0.055 %, fades [web] Giesserei-Lexikon (docs/gating-and-copper-facts.md "Iron")',
  },
];

/** The broad metal an alloy family belongs to: practice differs most between these. */
export type Metal = "aluminium" | "copper" | "iron";
export const metalOf = (family: AlloyFamily): Metal =>
  family.startsWith("al-") ? "aluminium" : family.endsWith("-iron") ? "iron" : "copper";

const normalise = (designation: string) => designation.trim().toUpperCase().replace(/\s+/g, "");

/**
 * The built-in alloy with this designation, ignoring case and spaces. A designation without the
 * Aluminum Association's ".0" casting suffix ("A356", "319") finds the ".0" alloy, as people write it.
 */
export function findBuiltInAlloy(designation: string): AlloySpec | undefined {
  const wanted = normalise(designation);
  if (wanted === "") return undefined;
  return (
    BUILT_IN_ALLOYS.find((a) => normalise(a.designation) === wanted) ??
    BUILT_IN_ALLOYS.find((a) => normalise(a.designation) === `${wanted}.0`) ??
    BUILT_IN_ALLOYS.find((a) => a.aliases?.some((x) => normalise(x) === wanted))
  );
}
