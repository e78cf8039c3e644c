import { LRUCache } from "lru-cache";
import { Engine, Operator } from "json-rules-engine";
import { findBuiltInAlloy, type AlloySpec } from "./alloys";
import type { DefectLocation, DefectType, DiagnosisCase } from "./case";
import type { Facts } from "./fact-catalog";
import { deriveFacts } from "./facts";
import {
  checkRule,
  conditionLeaves,
  isKnown,
  OPERATORS,
  RuleFileError,
  type KbCause,
  type KbRule,
  type RuleSet,
} from "./kb-schema";
import { BUILT_IN_RULE_SET, ruleSetVersion } from "./knowledge-base";
import {
  causeCautionsFor,
  displayFacts,
  missingInputs,
  priorCauses,
  rankCauses,
  type DiagnosisResult,
  type Hit,
} from "./rank";
import { safetyCautions } from "./safety";
import { alloyByFamilyGuess } from "./unknown-alloy";

export type { DiagnosisResult } from "./rank";
export type DiagnoseOptions = { alloy?: AlloySpec; ruleSet?: RuleSet; weightFactor?: (ruleId: string) => number };

/** Bad input the caller can fix (an alloy not in the table); the message lists what is accepted. */
export class DiagnosisInputError extends Error {
  readonly code = "unknown-alloy";
  constructor(
    readonly alloy: string,
    readonly accepted: string[],
  ) {
    super(`Unknown alloy "${alloy}". Accepted: ${accepted.join(", ")}`);
    this.name = "DiagnosisInputError";
  }
}

/**
 * Merge the shipped rules with a shop's own (checked like the shipped ones; ids stay unique), leaving
 * out disabled ones. The version is a hash of the result, so the engines are rebuilt only when it changes.
 */
export function ruleSetFor(builtIns: RuleSet, shopRules: KbRule[] = [], disabledIds: Iterable<string> = []): RuleSet {
  const causeIds = new Set(builtIns.causes.map((c) => c.id));
  const ids = new Set(builtIns.rules.map((r) => r.id));
  const problems = shopRules.flatMap((r) => [
    ...(ids.has(r.id) ? [`rule "${r.id}" is defined twice`] : (ids.add(r.id), [])),
    ...checkRule(r, causeIds),
  ]);
  if (problems.length) throw new RuleFileError(problems);
  const off = new Set(disabledIds);
  const rules = [...builtIns.rules, ...shopRules].filter((r) => !off.has(r.id));
  return { version: ruleSetVersion(builtIns.causes, rules), causes: builtIns.causes, rules };
}

/** Our operators replace the built-in ones of the same name, so unknown facts never match. */
function addOperators(engine: Engine) {
  for (const [name, fn] of Object.entries(OPERATORS))
    engine.addOperator(new Operator(name, (a, b) => (name === "isMissing" || isKnown(a) ? fn(a, b as never) : false)));
}

type Slot = { engine: Engine; rules: KbRule[]; factNames: string[]; queue: Promise<unknown> };
export type CompiledRuleSet = { version: string; byType: Map<DefectType, Slot>; causes: Map<string, KbCause> };

const CACHE_LIMIT = 32;
const cache = new LRUCache<string, CompiledRuleSet>({ max: CACHE_LIMIT });
let builds = 0;
/** How many engines have been built since start (tests and the bench check reuse with it). */
export const engineBuilds = () => builds;

/** One engine per defect type per rule-set version, built once and kept (a few shop versions at most). */
export function compiledRuleSet(rs: RuleSet): CompiledRuleSet {
  const hit = cache.get(rs.version);
  if (hit) return hit;
  const byType = new Map<DefectType, Slot>();
  for (const type of new Set(rs.rules.flatMap((r) => r.explains.map((e) => e.type)))) {
    const rules = rs.rules.filter((r) => r.explains.some((e) => e.type === type));
    const engine = new Engine([], { allowUndefinedFacts: true });
    addOperators(engine);
    for (const r of rules) engine.addRule({ name: r.id, conditions: r.conditions as never, event: { type: r.id } });
    const factNames = [...new Set(rules.flatMap((r) => conditionLeaves(r.conditions).map((l) => l.fact)))];
    byType.set(type, { engine, rules, factNames, queue: Promise.resolve() });
    builds++;
  }
  const compiled = { version: rs.version, byType, causes: new Map(rs.causes.map((c) => [c.id, c])) };
  cache.set(rs.version, compiled);
  return compiled;
}

/**
 * Runs one engine. Runs on one engine are queued: json-rules-engine keeps a single running/finished
 * status per engine, and a run that finishes while another is starting would make the second skip its rules.
 */
function runSlot(slot: Slot, facts: Facts): Promise<Set<string>> {
  const input: Facts = {};
  for (const name of slot.factNames) input[name] = facts[name];
  const run = slot.queue.then(() => slot.engine.run(input)).then((r) => new Set(r.events.map((e) => e.type)));
  slot.queue = run.catch(() => undefined);
  return run;
}

/** The rules of a defect type that fire on these facts (for the tests and the rule editor's trial run). */
export function firedRuleIds(rs: RuleSet | CompiledRuleSet, type: DefectType, facts: Facts): Promise<Set<string>> {
  const slot = ("byType" in rs ? rs : compiledRuleSet(rs)).byType.get(type);
  return slot ? runSlot(slot, facts) : Promise.resolve(new Set<string>());
}

const locationFits = (rule: KbRule, type: DefectType, at: DefectLocation) =>
  rule.explains.some((e) => e.type === type && (!e.locations || at === "throughout" || e.locations.includes(at)));

export async function diagnose(c: DiagnosisCase, options: DiagnoseOptions = {}): Promise<DiagnosisResult> {
  const notes: string[] = [];
  let alloy = options.alloy ?? findBuiltInAlloy(c.alloy);
  if (!alloy) {
    // An alloy the product does not know is diagnosed by its family, with a note, not refused.
    const guess = alloyByFamilyGuess(c);
    alloy = guess.alloy;
    notes.push(guess.note);
  }
  const compiled = compiledRuleSet(options.ruleSet ?? BUILT_IN_RULE_SET);
  const facts = deriveFacts(c, alloy);
  const types = [...new Set(c.defects.map((d) => d.type))];
  const fired = new Map(
    await Promise.all(types.map(async (t) => [t, await firedRuleIds(compiled, t, facts)] as const)),
  );
  const hits: Hit[] = [];
  const unfired: KbRule[] = [];
  for (const d of c.defects) {
    for (const rule of compiled.byType.get(d.type)?.rules ?? []) {
      if (!locationFits(rule, d.type, d.location ?? "throughout")) continue;
      if (fired.get(d.type)!.has(rule.id)) hits.push({ rule, severity: d.severity ?? 2 });
      else unfired.push(rule);
    }
  }
  const weightFactor = options.weightFactor ?? (() => 1);
  let causes = rankCauses(hits, compiled.causes, facts, weightFactor);
  if (causes.length === 0) {
    causes = priorCauses(
      unfired,
      compiled.causes,
      facts,
      weightFactor,
      hits.map((h) => h.rule),
    );
    if (causes.length)
      notes.push(
        "The conditions logged do not decide this: the causes below are ranked by how often each lies behind this defect in this process and metal. The inputs listed under what would sharpen the answer would decide it.",
      );
  }
  return {
    causes,
    facts: displayFacts(facts),
    ...safetyCautions(
      c,
      facts,
      causes.slice(0, 3).flatMap((x) => causeCautionsFor(compiled.causes.get(x.id)!, facts)),
    ),
    missing: missingInputs(unfired, facts, weightFactor, new Set(causes.map((x) => x.id))),
    notes,
  };
}
