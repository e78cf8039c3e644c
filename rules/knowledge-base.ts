import copper from "./kb/copper.json";
import cracking from "./kb/cracking.json";
import filling from "./kb/filling.json";
import gas from "./kb/gas.json";
import gating from "./kb/gating.json";
import inclusions from "./kb/inclusions.json";
import iron from "./kb/iron.json";
import melt from "./kb/melt.json";
import mould from "./kb/mould.json";
import shrinkage from "./kb/shrinkage.json";
import surface from "./kb/surface.json";
import { validateRuleFiles, type KbCause, type KbRule, type RuleSet } from "./kb-schema";

/**
 * The shipped knowledge base. Files are listed one by one (static JSON imports) so the same module
 * bundles for the client; a new file under rules/kb/ must be added here.
 */
export const BUILT_IN_RULE_FILES = [
  { name: "filling.json", json: filling as unknown },
  { name: "gas.json", json: gas as unknown },
  { name: "shrinkage.json", json: shrinkage as unknown },
  { name: "cracking.json", json: cracking as unknown },
  { name: "inclusions.json", json: inclusions as unknown },
  { name: "surface.json", json: surface as unknown },
  { name: "gating.json", json: gating as unknown },
  { name: "copper.json", json: copper as unknown },
  { name: "iron.json", json: iron as unknown },
  { name: "mould.json", json: mould as unknown },
  { name: "melt.json", json: melt as unknown },
];

/** FNV-1a, twice with different offsets for 64 bits: small, stable, and runs in the browser too. */
export function contentHash(text: string): string {
  let a = 0x811c9dc5;
  let b = 0x01000193 ^ 0x5bd1e995;
  for (let i = 0; i < text.length; i++) {
    const ch = text.charCodeAt(i);
    a = Math.imul(a ^ ch, 0x01000193);
    b = Math.imul(b ^ ch, 0x01000193);
  }
  return (a >>> 0).toString(16).padStart(8, "0") + (b >>> 0).toString(16).padStart(8, "0");
}

export const ruleSetVersion = (causes: KbCause[], rules: KbRule[]) => contentHash(JSON.stringify({ causes, rules }));

const { causes, rules } = validateRuleFiles(BUILT_IN_RULE_FILES);

export const BUILT_IN_RULE_SET: RuleSet = { version: ruleSetVersion(causes, rules), causes, rules };
