import type { AlloyFamily } from "./fact-catalog";

/**
 * Built-in casting alloys. Data only (plus the lookup): this list also seeds the alloy table, where a
 * shop may add its own. Every figure's source is in `sources`, tagged as in
 * shared/reference/foundry-facts.md: [std] standard, [hb] handbook, [web] secondary web source to be
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
  sources: string;
};

const AL_SHRINK = "shrink 1.30 % (5/32 in/ft) [web] patternmakers' shrink-rule charts";
const CU_SHRINK = "shrink 1.56 % (3/16 in/ft) [web] patternmakers' shrink-rule charts";

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
    sources: `solidus/liquidus [mem] ASM Handbook Vol. 2; density [mem]; ${AL_SHRINK}; Si 5 % nominal [mem]`,
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
    sources: `solidus/liquidus [mem] ASM Handbook Vol. 2 ([web] 580-630 °C); density [mem]; ${AL_SHRINK}; Si 5.25 % nominal [mem]`,
  },
  {
    designation: "535.0",
    family: "al-mg",
    solidusC: 570,
    liquidusC: 630,
    densityKgM3: 2620,
    shrinkAllowancePct: 1.3,
    sources: `solidus/liquidus [web]; density [mem]; ${AL_SHRINK}; Si only an impurity`,
  },
  {
    designation: "713.0",
    family: "al-zn",
    solidusC: 593,
    liquidusC: 638,
    densityKgM3: 2810,
    shrinkAllowancePct: 1.3,
    sources: `solidus/liquidus [web]; density [mem]; ${AL_SHRINK}; Si only an impurity`,
  },
  {
    designation: "A206.0",
    family: "al-cu",
    solidusC: 570,
    liquidusC: 650,
    densityKgM3: 2800,
    shrinkAllowancePct: 1.3,
    sources: `solidus/liquidus [mem], unverified; density [mem]; ${AL_SHRINK}; Si only an impurity`,
  },
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
  {
    designation: "C83600",
    family: "copper-base",
    solidusC: 854,
    liquidusC: 1010,
    densityKgM3: 8830,
    shrinkAllowancePct: 1.56,
    sources: `leaded red brass; solidus/liquidus [web] reproducing Copper Development Association data; density [mem]; ${CU_SHRINK}`,
  },
  {
    designation: "C85700",
    family: "copper-base",
    solidusC: 913,
    liquidusC: 941,
    densityKgM3: 8410,
    shrinkAllowancePct: 1.56,
    sources: `leaded yellow brass; solidus/liquidus [web] reproducing Copper Development Association data; density [mem]; ${CU_SHRINK}`,
  },
  {
    designation: "C90500",
    family: "copper-base",
    solidusC: 854,
    liquidusC: 1000,
    densityKgM3: 8720,
    shrinkAllowancePct: 1.56,
    sources: `tin bronze; solidus/liquidus [mem] Copper Development Association; density [mem]; ${CU_SHRINK}`,
  },
  {
    designation: "C95400",
    family: "copper-base",
    solidusC: 1027,
    liquidusC: 1038,
    densityKgM3: 7450,
    shrinkAllowancePct: 1.56,
    sources: `aluminium bronze; solidus/liquidus [mem] Copper Development Association; density [mem]; ${CU_SHRINK}`,
  },
];

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
    BUILT_IN_ALLOYS.find((a) => normalise(a.designation) === `${wanted}.0`)
  );
}
