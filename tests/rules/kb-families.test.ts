import { describe, it, expect } from "vitest";
import { caseSchema, type DefectType } from "@/rules/case";
import { diagnose } from "@/rules/engine";
import { BUILT_IN_RULE_SET } from "@/rules/knowledge-base";
import { ruleFileSchema } from "@/rules/kb-schema";
import shrinkage from "@/rules/kb/shrinkage.json";
import cracking from "@/rules/kb/cracking.json";
import inclusions from "@/rules/kb/inclusions.json";
import surface from "@/rules/kb/surface.json";

/**
 * Handbook-style cases for the shrinkage, cracking, inclusion and surface families. Each case is
 * built from a published cause list (the source is named beside it; [mem] where the list is recalled
 * rather than read, as in docs/foundry-facts.md). "first" cases: the handbook's cause
 * must rank first. "not first" cases: the conditions point elsewhere, so that cause must not.
 */
const MY_FILES = [shrinkage, cracking, inclusions, surface].map((json) => ruleFileSchema.parse(json));

type Check = { first: string } | { notFirst: string };
type Example = { name: string; type: DefectType; input: Record<string, unknown> } & Check;

const run = (type: DefectType, location: string, input: Record<string, unknown>) =>
  diagnose(
    caseSchema.parse({ alloy: "A356.0", process: "green-sand", ...input, defects: [{ type, location, severity: 2 }] }),
  );

const EXAMPLES: Example[] = [
  // --- shrinkage ---
  // Alloy rating tables [web]: shrinkage from poor feeding; remedy risers sized by modulus (riser modulus ≥ 1.2 × [mem]).
  {
    name: "no riser on a 6 mm plate with a 30 mm boss",
    type: "shrinkage",
    first: "insufficient-feeding",
    input: { location: "thick-section", pourTempC: 730, minSectionMm: 6, maxSectionMm: 30, hasRiser: false },
  },
  // Alloy rating tables [web]: isolated hot spots; remedies directional solidification, chills.
  {
    name: "riser fitted, but the 25 mm boss sits beyond 5 mm walls",
    type: "shrinkage",
    first: "isolated-hot-spot",
    input: { location: "thick-section", pourTempC: 720, minSectionMm: 5, maxSectionMm: 25, hasRiser: true },
  },
  // Alloy rating tables [web]: long freezing range; 319 freezes over 85 °C (ASM Vol. 2 [mem]).
  {
    name: "319 with a riser and even walls, porosity spread throughout",
    type: "shrinkage",
    first: "poor-feeding-alloy",
    input: {
      alloy: "319.0",
      process: "no-bake-sand",
      location: "throughout",
      pourTempC: 730,
      minSectionMm: 10,
      maxSectionMm: 14,
      hasRiser: true,
    },
  },
  // Common practice: near-eutectic 413 feeds well; poured 50 °C over the green-sand window (700-760 °C [mem]).
  {
    name: "413 poured far too hot, riser fitted: not the alloy's feeding",
    type: "shrinkage",
    notFirst: "poor-feeding-alloy",
    input: { alloy: "413.0", location: "top", pourTempC: 810, minSectionMm: 8, maxSectionMm: 10, hasRiser: true },
  },
  {
    name: "riser fitted and a long-freezing alloy: not a missing feeder",
    type: "shrinkage",
    notFirst: "insufficient-feeding",
    input: {
      alloy: "319.0",
      location: "throughout",
      pourTempC: 730,
      minSectionMm: 10,
      maxSectionMm: 12,
      hasRiser: true,
    },
  },

  // --- hot-tear ---
  // Uludag, Cetin and Dispinar (2018) [hb]: wide freezing range tears; A206 freezes over 80 °C [mem].
  {
    name: "A206 in a permanent mould, torn at a corner",
    type: "hot-tear",
    first: "hot-tear-prone-alloy",
    input: {
      alloy: "A206.0",
      process: "permanent-mould",
      location: "corner",
      pourTempC: 720,
      minSectionMm: 6,
      maxSectionMm: 10,
    },
  },
  // foundry-facts hot-tear row [hb]: hot spots; remedies chills, fillets.
  {
    name: "A356 torn at a 4 mm to 25 mm junction in green sand",
    type: "hot-tear",
    first: "isolated-hot-spot",
    input: { location: "thick-section", pourTempC: 730, minSectionMm: 4, maxSectionMm: 25 },
  },
  // Uludag et al. (2018) [hb]: near-eutectic A413 did not hot-tear; restraint is the published alternative.
  {
    name: "413 torn in a permanent mould: restraint, not the alloy",
    type: "hot-tear",
    notFirst: "hot-tear-prone-alloy",
    input: {
      alloy: "413.0",
      process: "permanent-mould",
      location: "side",
      pourTempC: 720,
      minSectionMm: 6,
      maxSectionMm: 8,
    },
  },

  // --- crack ---
  // ASM Vol. 15, Common Defects [mem]: iron from mixed scrap makes brittle intermetallics.
  {
    name: "mixed-scrap A356 cracked, even walls",
    type: "crack",
    first: "dirty-charge",
    input: { location: "side", charge: "mixed-scrap", pourTempC: 730, minSectionMm: 8, maxSectionMm: 10 },
  },
  // Campbell, Ten Rules, rule 9 residual stress [mem]: thick and thin sections cooling apart.
  {
    name: "ingot A356 cracked in a 4 mm web next to a 20 mm flange",
    type: "crack",
    first: "uneven-section-cooling",
    input: { location: "thin-section", charge: "ingot", pourTempC: 730, minSectionMm: 4, maxSectionMm: 20 },
  },
  {
    name: "ingot A356 with even walls cracked in no-bake: not uneven cooling",
    type: "crack",
    notFirst: "uneven-section-cooling",
    input: {
      process: "no-bake-sand",
      location: "side",
      charge: "ingot",
      pourTempC: 730,
      minSectionMm: 8,
      maxSectionMm: 10,
    },
  },

  // --- warp ---
  // ASM Vol. 15, Lost Foam Casting [mem]: a soft foam pattern distorts; 19-24 kg/m³ usual [web]/[mem].
  {
    name: "long lost-foam part of 16 kg/m³ foam, even walls",
    type: "warp",
    first: "pattern-distortion",
    input: {
      process: "lost-foam",
      location: "throughout",
      pourTempC: 760,
      foamDensityKgM3: 16,
      minSectionMm: 6,
      maxSectionMm: 7,
    },
  },
  // Campbell, Ten Rules, rule 9 [mem]: uneven section cooling distorts.
  {
    name: "5 mm green-sand plate with 20 mm ribs bowed",
    type: "warp",
    first: "uneven-section-cooling",
    input: { location: "thin-section", pourTempC: 730, minSectionMm: 5, maxSectionMm: 20 },
  },
  {
    name: "lost-foam part with even walls: not uneven cooling",
    type: "warp",
    notFirst: "uneven-section-cooling",
    input: {
      process: "lost-foam",
      location: "throughout",
      pourTempC: 760,
      foamDensityKgM3: 20,
      minSectionMm: 6,
      maxSectionMm: 8,
    },
  },

  // --- dross-inclusion ---
  // Campbell, Ten Rules, rule 2 [hb]: a 250 mm free fall (2.2 m/s) is far above 0.5 m/s.
  {
    name: "clean ingot melt, skimmed and fluxed, down a 250 mm sprue",
    type: "dross-inclusion",
    first: "turbulent-fill",
    input: {
      location: "near-gate",
      charge: "ingot",
      skimmed: true,
      fluxed: true,
      pourTempC: 730,
      sprueHeightMm: 250,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },
  // Campbell [hb] via foundry-facts: remedies skimming and cleaning flux.
  {
    name: "unskimmed, unfluxed melt down a short sprue",
    type: "dross-inclusion",
    first: "melt-not-cleaned",
    input: {
      location: "top",
      charge: "ingot",
      skimmed: false,
      fluxed: false,
      pourTempC: 730,
      sprueHeightMm: 60,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },
  {
    name: "unskimmed mixed scrap down a short sprue: not turbulence first",
    type: "dross-inclusion",
    notFirst: "turbulent-fill",
    input: {
      location: "top",
      charge: "mixed-scrap",
      skimmed: false,
      pourTempC: 730,
      sprueHeightMm: 60,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },

  // --- sand-inclusion ---
  // Campbell, rule 2 [hb]: a fast stream erodes the mould where it strikes; a pressurised 1:2:1 system
  // jets at sprue-base speed (docs/gating-and-copper-facts.md "Filling").
  {
    name: "sand by the gate, 300 mm sprue gated 1:2:1, sand at 3.5 %",
    type: "sand-inclusion",
    first: "sand-erosion",
    input: {
      location: "near-gate",
      sandMoisturePct: 3.5,
      sandType: "synthetic-bentonite",
      gatingRatio: "1:2:1",
      pourTempC: 730,
      sprueHeightMm: 300,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },
  // ASM Vol. 15, Lost Foam Casting [mem]: the coating holds the unbonded sand back.
  {
    name: "uncoated lost-foam pattern",
    type: "sand-inclusion",
    first: "coating-missing-or-thin",
    input: {
      process: "lost-foam",
      location: "side",
      coating: { applied: false },
      pourTempC: 760,
      sprueHeightMm: 150,
      minSectionMm: 6,
      maxSectionMm: 10,
    },
  },
  // Green sand usually 3-5 % water [mem]: dry sand is friable.
  {
    name: "green sand at 1.8 % water, gentle 50 mm sprue",
    type: "sand-inclusion",
    first: "friable-dry-sand",
    input: {
      location: "corner",
      sandMoisturePct: 1.8,
      pourTempC: 730,
      sprueHeightMm: 50,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },
  {
    name: "dry green sand with a gentle sprue: not erosion",
    type: "sand-inclusion",
    notFirst: "sand-erosion",
    input: {
      location: "near-gate",
      sandMoisturePct: 1.8,
      pourTempC: 730,
      sprueHeightMm: 50,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },

  // --- metal-penetration ---
  // ASM Vol. 15, Common Defects [mem]: high pouring temperature; green-sand window 700-760 °C [mem].
  {
    name: "A356 poured at 810 °C into green sand",
    type: "metal-penetration",
    first: "hot-pour",
    input: {
      location: "side",
      sandMoisturePct: 4,
      pourTempC: 810,
      sprueHeightMm: 150,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },
  // ASM Vol. 15, Common Defects [mem]: metallostatic pressure; brass is about 3 × aluminium's density.
  {
    name: "yellow brass in its window under a 250 mm sprue, penetration at the bottom",
    type: "metal-penetration",
    first: "high-metallostatic-head",
    input: {
      alloy: "C85700",
      location: "bottom",
      sandMoisturePct: 4,
      pourTempC: 1100,
      sprueHeightMm: 250,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },
  // ASM Vol. 15, Lost Foam Casting [mem]: uncoated foam leaves the metal against loose sand.
  {
    name: "uncoated lost-foam pattern poured in the window",
    type: "metal-penetration",
    first: "coating-missing-or-thin",
    input: {
      process: "lost-foam",
      location: "side",
      coating: { applied: false },
      pourTempC: 760,
      sprueHeightMm: 150,
      minSectionMm: 6,
      maxSectionMm: 10,
    },
  },
  {
    name: "brass poured inside its window: not the pour temperature",
    type: "metal-penetration",
    notFirst: "hot-pour",
    input: {
      alloy: "C85700",
      location: "bottom",
      sandMoisturePct: 4,
      pourTempC: 1100,
      sprueHeightMm: 250,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },

  // --- rough-surface ---
  // Synthetic bentonite sand about 2.5-4.5 % water [mem]: wetter sand steams and scabs at the face (common practice).
  {
    name: "synthetic bentonite green sand at 7 % water",
    type: "rough-surface",
    first: "mould-moisture",
    input: {
      location: "throughout",
      sandMoisturePct: 7,
      sandType: "synthetic-bentonite",
      pourTempC: 730,
      sprueHeightMm: 100,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },
  {
    name: "green sand at 1.5 % water",
    type: "rough-surface",
    first: "friable-dry-sand",
    input: {
      location: "throughout",
      sandMoisturePct: 1.5,
      pourTempC: 730,
      sprueHeightMm: 100,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },
  // ASM Vol. 15, Lost Foam Casting [hb]: dense foam leaves more liquid residue at the surface.
  {
    name: "lost foam of 28 kg/m³, coating dried: not mould moisture",
    type: "rough-surface",
    notFirst: "mould-moisture",
    input: {
      process: "lost-foam",
      location: "top",
      foamDensityKgM3: 28,
      coating: { applied: true, dried: true, coats: 1 },
      pourTempC: 760,
      minSectionMm: 6,
      maxSectionMm: 8,
    },
  },

  // --- sand-collapse ---
  // ASM Vol. 15, Lost Foam Casting [mem]: the coating carries the sand wall once the foam has gone.
  {
    name: "uncoated lost-foam pattern caved in",
    type: "sand-collapse",
    first: "coating-missing-or-thin",
    input: {
      process: "lost-foam",
      location: "top",
      coating: { applied: false },
      pourTempC: 760,
      pourTimeS: 10,
      minSectionMm: 6,
      maxSectionMm: 10,
    },
  },
  // ASM Vol. 15, Lost Foam Casting [mem]: an interrupted pour leaves the cavity unsupported.
  {
    name: "coated lost-foam poured slowly over 25 s",
    type: "sand-collapse",
    first: "slow-or-interrupted-pour",
    input: {
      process: "lost-foam",
      location: "top",
      coating: { applied: true, dried: true, coats: 1 },
      pourTempC: 760,
      pourTimeS: 25,
      minSectionMm: 6,
      maxSectionMm: 10,
    },
  },
  {
    name: "dry green sand dropped from the cope: not the pour",
    type: "sand-collapse",
    notFirst: "slow-or-interrupted-pour",
    input: { location: "top", sandMoisturePct: 2, pourTempC: 730, pourTimeS: 25, minSectionMm: 8, maxSectionMm: 12 },
  },

  // --- swell ---
  // ASM Vol. 15, Common Defects [mem]: soft, weak mould; wet green sand is plastic.
  {
    name: "synthetic bentonite green sand at 7 % water bulged",
    type: "swell",
    first: "mould-moisture",
    input: {
      location: "side",
      sandMoisturePct: 7,
      sandType: "synthetic-bentonite",
      pourTempC: 730,
      sprueHeightMm: 150,
      minSectionMm: 8,
      maxSectionMm: 20,
    },
  },
  // ASM Vol. 15, Common Defects [mem]: excessive metallostatic pressure.
  {
    name: "red brass in no-bake under a 200 mm sprue",
    type: "swell",
    first: "high-metallostatic-head",
    input: {
      alloy: "C83600",
      process: "no-bake-sand",
      location: "bottom",
      pourTempC: 1150,
      sprueHeightMm: 200,
      minSectionMm: 10,
      maxSectionMm: 25,
    },
  },
  {
    name: "green sand at 4 % water under a 350 mm sprue: not moisture",
    type: "swell",
    notFirst: "mould-moisture",
    input: {
      location: "bottom",
      sandMoisturePct: 4,
      pourTempC: 730,
      sprueHeightMm: 350,
      minSectionMm: 8,
      maxSectionMm: 20,
    },
  },

  // --- flash ---
  // Investment shells crack on dewaxing, fins follow (common practice, [mem]).
  {
    name: "investment shell of 3 coats finned",
    type: "flash",
    first: "mould-cracked",
    input: {
      process: "investment",
      location: "side",
      coating: { applied: true, dried: true, coats: 3 },
      pourTempC: 720,
      sprueHeightMm: 150,
      minSectionMm: 4,
      maxSectionMm: 8,
    },
  },
  // ASM Vol. 15, Common Defects [mem]: a fin at the parting line is a mould that did not close.
  {
    name: "green-sand aluminium poured in the window, low sprue",
    type: "flash",
    first: "poor-mould-fit",
    input: {
      location: "side",
      sandMoisturePct: 4,
      pourTempC: 730,
      sprueHeightMm: 120,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },
  {
    name: "brass under a 250 mm sprue in green sand: the head, not the fit",
    type: "flash",
    notFirst: "poor-mould-fit",
    input: {
      alloy: "C85700",
      location: "side",
      sandMoisturePct: 4,
      pourTempC: 1100,
      sprueHeightMm: 250,
      minSectionMm: 8,
      maxSectionMm: 12,
    },
  },
];

describe("knowledge base: shrinkage, cracking, inclusions and surface families", () => {
  it("loads all four files into the built-in rule set", () => {
    const ids = new Set(BUILT_IN_RULE_SET.rules.map((r) => r.id));
    for (const file of MY_FILES) for (const r of file.rules) expect(ids).toContain(r.id);
  });

  it("gives every defect type of these families at least four causes and some evidence against", () => {
    const rules = MY_FILES.flatMap((f) => f.rules);
    const types: DefectType[] = [
      "shrinkage",
      "hot-tear",
      "crack",
      "warp",
      "dross-inclusion",
      "sand-inclusion",
      "metal-penetration",
      "rough-surface",
      "sand-collapse",
      "swell",
      "flash",
    ];
    for (const type of types) {
      const mine = rules.filter((r) => r.explains.some((e) => e.type === type));
      expect(
        new Set(mine.filter((r) => r.effect === "supports").map((r) => r.cause)).size,
        type,
      ).toBeGreaterThanOrEqual(4);
      expect(
        mine.some((r) => r.effect === "weakens"),
        type,
      ).toBe(true);
    }
  });

  for (const ex of EXAMPLES) {
    const { location, ...input } = ex.input as { location: string };
    it(`${ex.type}: ${ex.name}`, async () => {
      const { causes } = await run(ex.type, location, input);
      expect(causes.length).toBeGreaterThan(0);
      if ("first" in ex) expect(causes[0].id, JSON.stringify(causes.map((c) => [c.id, c.score]))).toBe(ex.first);
      else expect(causes[0].id, JSON.stringify(causes.map((c) => [c.id, c.score]))).not.toBe(ex.notFirst);
    });
  }
});
