import type { CastingInput, MeltInput } from "../../lib/notebook-schemas";
import type { DefectLocation, DefectType } from "../../rules/case";
import type { DrawnDefect, PartShape } from "./demo-drawings";

/**
 * The demo shop's notebook: twelve melts and their castings, poured the way a small shop pours, with
 * the defects those conditions give (cold lost-foam pours that misran, gas porosity on a humid day
 * with an undegassed scrap charge, shrinkage at a thick section without a riser, and so on).
 * Invented parts and notes. Values SI. server/seed/seed-notebook.ts stores them through the API's own services.
 */
type DemoMark = { type: DefectType; location: DefectLocation; severity: number; note?: string; draw: DrawnDefect };
export type DemoCasting = Omit<CastingInput, "marks"> & {
  marks?: DemoMark[];
  /** Draw an illustration of this shape and pin the marks on it. */
  photo?: PartShape;
  diagnose?: boolean;
  comments?: { by: "mentor" | "caster" | "owner"; body: string }[];
};
export type DemoMelt = Omit<MeltInput, "pouredOn"> & { daysAgo: number; by: "caster" | "mentor"; castings: DemoCasting[] };

const gasLaden = { fluxed: false, skimmed: true } as const;
const foamMould = { sandMoisturePct: 0, coatingApplied: true, foamDensityKgM3: 20 } as const;
const plate = { partName: "Ribbed cover plate", pattern: "Foam P-12", minSectionMm: 4, maxSectionMm: 12, sprueHeightMm: 200, pourTimeS: 6, hasRiser: false, hasVents: false, orientation: "ribs up" } as const;

export const DEMO_MELTS: DemoMelt[] = [
  {
    daysAgo: 84, by: "caster", alloy: "A356.0", process: "green-sand", charge: "ingot", furnace: "Propane crucible furnace A",
    meltTempC: 765, pourTempC: 735, degassing: "rotary", degasMinutes: 8, fluxed: true, skimmed: true,
    ambientTempC: 18, humidityPct: 50, sandMoisturePct: 4, notes: "Fresh ingot, new crucible seasoned the day before.",
    castings: [
      { partName: "V-belt pulley", pattern: "Wood PU-80", minSectionMm: 6, maxSectionMm: 22, sprueHeightMm: 180, pourTimeS: 7, hasRiser: true, hasVents: true, outcome: "good", photo: "wheel" },
      { partName: "Shelf bracket", pattern: "Wood SB-2", minSectionMm: 6, maxSectionMm: 10, sprueHeightMm: 150, pourTimeS: 4, hasVents: true, outcome: "good" },
      { partName: "Drawer handle", pattern: "Printed DH-1", minSectionMm: 5, maxSectionMm: 9, sprueHeightMm: 150, pourTimeS: 3, outcome: "good" },
    ],
  },
  {
    daysAgo: 77, by: "caster", alloy: "A356.0", process: "lost-foam", charge: "ingot", furnace: "Propane crucible furnace A",
    meltTempC: 725, pourTempC: 705, degassing: "argon-lance", degasMinutes: 5, fluxed: true, skimmed: true,
    ambientTempC: 6, humidityPct: 55, ...foamMould, coatingDried: true, coatingCoats: 1,
    notes: "Cold morning; the crucible sat while the flask was carried across the yard.",
    castings: [
      {
        ...plate, outcome: "scrap", photo: "plate", diagnose: true, notes: "Far end of the ribs never filled.",
        marks: [
          { type: "misrun", location: "far-from-gate", severity: 3, draw: { kind: "unfilled", x: 0.8, y: 0.3 } },
          { type: "cold-shut", location: "thin-section", severity: 2, note: "lap line across the third rib", draw: { kind: "line", x: 0.55, y: 0.62 } },
        ],
        comments: [
          { by: "caster", body: "Pot read 705 °C at the pour but it had been sitting a good three minutes." },
          { by: "mentor", body: "Lost foam eats heat at the front. Pour nearer 770 °C and carry the crucible straight over." },
        ],
      },
      { partName: "Manifold flange", pattern: "Foam MF-3", minSectionMm: 5, maxSectionMm: 14, sprueHeightMm: 200, pourTimeS: 5, hasRiser: false, hasVents: false, outcome: "scrap", photo: "flange",
        marks: [{ type: "misrun", location: "thin-section", severity: 2, draw: { kind: "unfilled", x: 0.3, y: 0.25 } }] },
      { partName: "Impeller blank", pattern: "Foam IB-1", minSectionMm: 6, maxSectionMm: 20, sprueHeightMm: 200, pourTimeS: 6, outcome: "rework",
        marks: [{ type: "rounded-edges", location: "corner", severity: 1, draw: { kind: "unfilled", x: 0.2, y: 0.2 } }] },
    ],
  },
  {
    daysAgo: 70, by: "caster", alloy: "A356.0", process: "lost-foam", charge: "ingot", furnace: "Propane crucible furnace A",
    meltTempC: 800, pourTempC: 775, degassing: "argon-lance", degasMinutes: 6, fluxed: true, skimmed: true,
    ambientTempC: 12, humidityPct: 48, ...foamMould, coatingDried: true, coatingCoats: 1,
    notes: "Second try at the cover plate: hotter, crucible carried straight to the flask.",
    castings: [
      { ...plate, outcome: "good", photo: "plate", notes: "Filled to the last rib.", comments: [{ by: "mentor", body: "That is the fix. Keep 770-780 °C for this plate." }] },
      { partName: "Intake elbow", pattern: "Foam IE-2", minSectionMm: 4, maxSectionMm: 10, sprueHeightMm: 220, pourTimeS: 5, outcome: "good" },
      { partName: "Gear blank", pattern: "Foam GB-5", minSectionMm: 8, maxSectionMm: 25, sprueHeightMm: 200, pourTimeS: 7, hasOverflow: false, outcome: "rework",
        marks: [{ type: "fold", location: "side", severity: 1, draw: { kind: "line", x: 0.5, y: 0.5 } }] },
    ],
  },
  {
    daysAgo: 63, by: "caster", alloy: "319.0", process: "green-sand", charge: "mixed-scrap", furnace: "Oil-fired tilting furnace",
    meltTempC: 800, pourTempC: 760, degassing: "none", ...gasLaden,
    ambientTempC: 26, humidityPct: 92, sandMoisturePct: 6.5,
    notes: "Muggy day after rain. Scrap was the old cylinder-head offcuts from the outdoor bin.",
    castings: [
      { partName: "Valve body", pattern: "Wood VB-7", minSectionMm: 8, maxSectionMm: 20, sprueHeightMm: 200, pourTimeS: 6, hasRiser: true, hasVents: true, outcome: "scrap", photo: "block", diagnose: true,
        marks: [{ type: "gas-porosity", location: "throughout", severity: 3, note: "bright round pinholes on every machined face", draw: { kind: "spots", x: 0.5, y: 0.55 } }] },
      { partName: "Pump cover", pattern: "Wood PC-2", minSectionMm: 6, maxSectionMm: 12, sprueHeightMm: 180, pourTimeS: 5, hasVents: true, outcome: "rework",
        marks: [{ type: "gas-porosity", location: "top", severity: 2, draw: { kind: "spots", x: 0.5, y: 0.3 } }] },
      { partName: "Shelf bracket", pattern: "Wood SB-2", minSectionMm: 6, maxSectionMm: 10, sprueHeightMm: 150, pourTimeS: 4, hasVents: false, outcome: "scrap", photo: "bracket",
        marks: [{ type: "blowhole", location: "top", severity: 2, draw: { kind: "spots", x: 0.3, y: 0.3 } }] },
    ],
  },
  {
    daysAgo: 56, by: "mentor", alloy: "A356.0", process: "no-bake-sand", charge: "clean-scrap", furnace: "Electric pot furnace",
    meltTempC: 760, pourTempC: 730, degassing: "tablet", degasMinutes: 3, fluxed: true, skimmed: true,
    ambientTempC: 15, humidityPct: 60, sandMoisturePct: 0.5,
    castings: [
      { partName: "Bench block", pattern: "Wood BB-60", minSectionMm: 8, maxSectionMm: 60, sprueHeightMm: 200, pourTimeS: 9, hasRiser: false, hasVents: true, outcome: "scrap", photo: "block", diagnose: true,
        notes: "Sink on the top face over the heavy boss.",
        marks: [{ type: "shrinkage", location: "thick-section", severity: 3, note: "jagged cavity under the boss", draw: { kind: "cavity", x: 0.5, y: 0.35 } }] },
      { partName: "Vise jaw", pattern: "Wood VJ-40", minSectionMm: 10, maxSectionMm: 40, sprueHeightMm: 200, pourTimeS: 7, hasRiser: true, outcome: "good" },
      { partName: "Chuck backplate", pattern: "Wood CB-1", minSectionMm: 12, maxSectionMm: 35, sprueHeightMm: 200, pourTimeS: 8, hasRiser: true, outcome: "rework",
        marks: [{ type: "shrinkage", location: "thick-section", severity: 1, draw: { kind: "cavity", x: 0.5, y: 0.5 } }] },
    ],
  },
  {
    daysAgo: 49, by: "mentor", alloy: "C83600", process: "green-sand", charge: "ingot", furnace: "Oil-fired tilting furnace",
    meltTempC: 1180, pourTempC: 1150, degassing: "none", fluxed: true, skimmed: true,
    ambientTempC: 12, humidityPct: 60, sandMoisturePct: 4.5, notes: "Red brass for the boat-club order.",
    castings: [
      { partName: "Boat cleat", pattern: "Wood BC-6", minSectionMm: 8, maxSectionMm: 18, sprueHeightMm: 180, pourTimeS: 4, hasRiser: true, outcome: "good", photo: "bar" },
      { partName: "Door knocker", pattern: "Wood DK-1", minSectionMm: 6, maxSectionMm: 15, sprueHeightMm: 180, pourTimeS: 4, outcome: "rework",
        marks: [{ type: "sand-inclusion", location: "side", severity: 2, draw: { kind: "flecks", x: 0.4, y: 0.5 } }] },
      { partName: "House nameplate", pattern: "Wood NP-3", minSectionMm: 5, maxSectionMm: 8, sprueHeightMm: 150, pourTimeS: 3, outcome: "good" },
    ],
  },
  {
    daysAgo: 42, by: "caster", alloy: "713.0", process: "green-sand", charge: "ingot", furnace: "Electric pot furnace",
    meltTempC: 745, pourTempC: 720, degassing: "argon-lance", degasMinutes: 5, fluxed: true, skimmed: true,
    ambientTempC: 14, humidityPct: 55, sandMoisturePct: 5,
    castings: [
      { partName: "Lever arm", pattern: "Wood LA-2", minSectionMm: 5, maxSectionMm: 25, sprueHeightMm: 180, pourTimeS: 5, hasRiser: false, outcome: "scrap", photo: "bracket",
        notes: "Cracked where the arm meets the hub; the core was hard-rammed.",
        marks: [{ type: "hot-tear", location: "corner", severity: 2, draw: { kind: "line", x: 0.42, y: 0.68 } }] },
      { partName: "Cabinet knob", pattern: "Printed CK-1", minSectionMm: 6, maxSectionMm: 14, sprueHeightMm: 150, pourTimeS: 3, outcome: "good" },
    ],
  },
  {
    daysAgo: 35, by: "caster", alloy: "A356.0", process: "investment", charge: "ingot", furnace: "Electric pot furnace",
    meltTempC: 740, pourTempC: 715, degassing: "argon-lance", degasMinutes: 5, fluxed: true, skimmed: true,
    ambientTempC: 17, humidityPct: 45, notes: "Shells preheated to about 500 °C in the kiln.",
    castings: [
      { partName: "Turbine vane model", pattern: "Wax TV-1", minSectionMm: 1.5, maxSectionMm: 6, sprueHeightMm: 120, pourTimeS: 2, outcome: "scrap",
        marks: [{ type: "misrun", location: "thin-section", severity: 3, draw: { kind: "unfilled", x: 0.8, y: 0.5 } }] },
      { partName: "Scale bracket", pattern: "Wax SB-4", minSectionMm: 3, maxSectionMm: 8, sprueHeightMm: 120, pourTimeS: 2, outcome: "good" },
      { partName: "Leaf ornament", pattern: "Wax LO-2", minSectionMm: 2, maxSectionMm: 5, sprueHeightMm: 120, pourTimeS: 2, outcome: "rework",
        marks: [{ type: "rough-surface", location: "throughout", severity: 1, draw: { kind: "flecks", x: 0.5, y: 0.5 } }] },
    ],
  },
  {
    daysAgo: 28, by: "caster", alloy: "A356.0", process: "permanent-mould", charge: "ingot", furnace: "Electric pot furnace",
    meltTempC: 735, pourTempC: 710, degassing: "rotary", degasMinutes: 8, fluxed: true, skimmed: true,
    ambientTempC: 16, humidityPct: 50, notes: "Steel die preheated with the torch; first pour of the day.",
    castings: [
      { partName: "Piston blank", pattern: "Die PB-1", minSectionMm: 8, maxSectionMm: 30, sprueHeightMm: 150, pourTimeS: 4, hasRiser: true, outcome: "good" },
      { partName: "Cup", pattern: "Die CU-2", minSectionMm: 4, maxSectionMm: 8, sprueHeightMm: 150, pourTimeS: 6, outcome: "rework",
        marks: [{ type: "cold-shut", location: "side", severity: 2, draw: { kind: "line", x: 0.5, y: 0.4 } }] },
      { partName: "Tensile test bar", pattern: "Die TB-1", minSectionMm: 12, maxSectionMm: 12, sprueHeightMm: 150, pourTimeS: 3, hasRiser: true, outcome: "good" },
    ],
  },
  {
    daysAgo: 21, by: "caster", alloy: "A356.0", process: "green-sand", charge: "clean-scrap", furnace: "Propane crucible furnace A",
    meltTempC: 780, pourTempC: 750, degassing: "argon-lance", degasMinutes: 4, fluxed: false, skimmed: false,
    ambientTempC: 10, humidityPct: 55, sandMoisturePct: 4,
    notes: "Tall cope; poured straight down a 400 mm sprue with no filter.",
    castings: [
      { partName: "Gearbox housing", pattern: "Wood GH-1", minSectionMm: 6, maxSectionMm: 18, sprueHeightMm: 400, pourTimeS: 5, hasRiser: true, outcome: "scrap", photo: "block", diagnose: true,
        marks: [{ type: "dross-inclusion", location: "near-gate", severity: 2, note: "grey oxide skins under the ingate", draw: { kind: "flecks", x: 0.3, y: 0.7 } }] },
      { partName: "Inspection cover", pattern: "Wood IC-3", minSectionMm: 5, maxSectionMm: 10, sprueHeightMm: 400, pourTimeS: 4, outcome: "rework",
        marks: [{ type: "dross-inclusion", location: "top", severity: 1, draw: { kind: "flecks", x: 0.5, y: 0.3 } }] },
    ],
  },
  {
    daysAgo: 14, by: "caster", alloy: "355.0", process: "plaster", charge: "ingot", furnace: "Electric pot furnace",
    meltTempC: 745, pourTempC: 720, degassing: "argon-lance", degasMinutes: 5, fluxed: true, skimmed: true,
    ambientTempC: 18, humidityPct: 40, notes: "Plaster moulds baked overnight.",
    castings: [
      { partName: "Club medallion", pattern: "Plaster CM-1", minSectionMm: 3, maxSectionMm: 6, sprueHeightMm: 100, pourTimeS: 3, hasVents: false, outcome: "rework",
        marks: [{ type: "misrun", location: "corner", severity: 2, draw: { kind: "unfilled", x: 0.25, y: 0.25 } }] },
      { partName: "Wall plaque", pattern: "Plaster WP-2", minSectionMm: 4, maxSectionMm: 8, sprueHeightMm: 100, pourTimeS: 3, hasVents: true, outcome: "good" },
    ],
  },
  {
    daysAgo: 7, by: "caster", alloy: "A356.0", process: "lost-foam", charge: "ingot", furnace: "Propane crucible furnace A",
    meltTempC: 790, pourTempC: 770, degassing: "argon-lance", degasMinutes: 6, fluxed: true, skimmed: true,
    ambientTempC: 9, humidityPct: 70, ...foamMould, foamDensityKgM3: 24, coatingDried: false, coatingCoats: 3,
    notes: "Rushed: third coat of wash went on that morning and the patterns were still damp.",
    castings: [
      { ...plate, outcome: "scrap", photo: "plate", diagnose: true,
        marks: [
          { type: "rounded-edges", location: "top", severity: 3, draw: { kind: "unfilled", x: 0.5, y: 0.22 } },
          { type: "carbon-residue", location: "top", severity: 2, draw: { kind: "soot", x: 0.45, y: 0.4 } },
        ],
        comments: [{ by: "mentor", body: "Hot enough this time; the thick wet coating held the foam gas in. One coat, dried overnight." }] },
      { partName: "Shelf bracket", pattern: "Foam SB-2", minSectionMm: 6, maxSectionMm: 10, sprueHeightMm: 200, pourTimeS: 4, outcome: "rework",
        marks: [{ type: "fold", location: "side", severity: 2, draw: { kind: "line", x: 0.5, y: 0.5 } }] },
    ],
  },
];
