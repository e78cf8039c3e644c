/**
 * `npm run bench:diagnose`: how long one diagnosis takes over the whole knowledge base, how long
 * 10,000 stored-style cases take, and what building the engines on every call would cost instead.
 * Prints figures only (targets: median ≤ 2 ms, 10,000 cases ≤ 10 s); nothing is asserted.
 */
import { performance } from "node:perf_hooks";
import { BUILT_IN_ALLOYS, metalOf } from "../rules/alloys";
import {
  CHARGES,
  DEFECT_LOCATIONS,
  DEFECT_TYPES,
  DEGASSING_METHODS,
  PROCESSES,
  type DiagnosisCase,
} from "../rules/case";
import { diagnose, engineBuilds } from "../rules/engine";
import { BUILT_IN_RULE_SET } from "../rules/knowledge-base";
import { rng } from "./seeded-random";

/** Cases shaped like stored castings: a few marks, most fields logged, some left out. */
function makeCases(count: number, seed = 42): DiagnosisCase[] {
  const r = rng(seed);
  const pick = <T>(xs: readonly T[]) => xs[Math.floor(r() * xs.length)];
  const maybe = <T>(v: T, p = 0.8) => (r() < p ? v : undefined);
  const num = (lo: number, hi: number, step = 1) => Math.round((lo + r() * (hi - lo)) / step) * step;
  return Array.from({ length: count }, () => {
    const alloy =
      r() < 0.85 ? pick(BUILT_IN_ALLOYS.filter((a) => metalOf(a.family) === "aluminium")) : pick(BUILT_IN_ALLOYS);
    const process = pick(PROCESSES);
    const minSectionMm = maybe(num(1.5, 12, 0.5));
    return {
      defects: Array.from({ length: 1 + Math.floor(r() * 3) }, () => ({
        type: pick(DEFECT_TYPES),
        location: pick(DEFECT_LOCATIONS),
        severity: 1 + Math.floor(r() * 3),
      })),
      alloy: alloy.designation,
      process,
      pourTempC: maybe(alloy.liquidusC + num(40, 220)),
      meltTempC: maybe(alloy.liquidusC + num(80, 260)),
      degassing: maybe(pick(DEGASSING_METHODS)),
      degasMinutes: maybe(num(0, 20)),
      fluxed: maybe(r() < 0.5),
      skimmed: maybe(r() < 0.7),
      charge: maybe(pick(CHARGES)),
      ambientTempC: maybe(num(0, 35)),
      humidityPct: maybe(num(20, 95)),
      sandMoisturePct: process === "green-sand" || process === "no-bake-sand" ? maybe(num(0.5, 8, 0.1)) : undefined,
      coating:
        process === "lost-foam" || process === "investment"
          ? { applied: true, dried: maybe(r() < 0.6), coats: maybe(num(1, 4)) }
          : undefined,
      foamDensityKgM3: process === "lost-foam" ? maybe(num(16, 32)) : undefined,
      minSectionMm,
      maxSectionMm: minSectionMm !== undefined ? maybe(minSectionMm + num(0, 40)) : undefined,
      sprueHeightMm: maybe(num(50, 350, 10)),
      pourTimeS: maybe(num(2, 20)),
      hasRiser: maybe(r() < 0.5),
      hasOverflow: maybe(r() < 0.4),
      hasVents: maybe(r() < 0.5),
    };
  });
}

const ms = (t: number) => `${t.toFixed(3)} ms`;
const mean = (xs: number[]) => xs.reduce((a, b) => a + b, 0) / xs.length;
const quantile = (sorted: number[], q: number) => sorted[Math.min(sorted.length - 1, Math.floor(q * sorted.length))];

async function timeEach(cases: DiagnosisCase[], run: (c: DiagnosisCase, i: number) => Promise<unknown>) {
  const times: number[] = [];
  for (let i = 0; i < cases.length; i++) {
    const t0 = performance.now();
    await run(cases[i], i);
    times.push(performance.now() - t0);
  }
  return times.sort((a, b) => a - b);
}

const rs = BUILT_IN_RULE_SET;
console.log(`Knowledge base ${rs.version}: ${rs.rules.length} rules, ${rs.causes.length} causes`);

const warm = makeCases(500, 1);
for (const c of warm) await diagnose(c); // JIT and engine build

const single = await timeEach(makeCases(2000, 7), (c) => diagnose(c));
const median = quantile(single, 0.5);
console.log(`One diagnosis (2,000 varied cases): median ${ms(median)}, p99 ${ms(quantile(single, 0.99))}`);

const buildsBefore = engineBuilds();
const stored = makeCases(10_000, 42);
const t0 = performance.now();
for (const c of stored) await diagnose(c);
const totalS = (performance.now() - t0) / 1000;
console.log(
  `10,000 stored-style cases: ${totalS.toFixed(2)} s (${((totalS * 1000) / stored.length).toFixed(3)} ms each); engines built meanwhile: ${engineBuilds() - buildsBefore}`,
);

// The same diagnosis with the engines built afresh for every call: a new rule-set version each time.
const fresh = await timeEach(makeCases(300, 9), (c, i) => diagnose(c, { ruleSet: { ...rs, version: `bench-${i}` } }));
const freshMedian = quantile(fresh, 0.5);
console.log(`New engines on every call (300 cases): median ${ms(freshMedian)}, p99 ${ms(quantile(fresh, 0.99))}`);
console.log(
  `Ratio, new engines per call over cached engines: ${(freshMedian / median).toFixed(1)}x (medians), ${(mean(fresh) / mean(single)).toFixed(1)}x (means)`,
);
console.log(
  `Targets: median ≤ 2 ms (${median <= 2 ? "met" : "missed"}), 10,000 cases ≤ 10 s (${totalS <= 10 ? "met" : "missed"})`,
);

// Then the same engine behind the server, over HTTP, at shop sizes (scripts/bench-diagnose-http.ts).
await import("./bench-diagnose-http");
