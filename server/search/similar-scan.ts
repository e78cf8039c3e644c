import type { ShopIndex, IndexedCase } from "./shop-index";
import {
  ALIKE_MIN,
  conditionShare,
  defectShare,
  keepBest,
  likenessOf,
  placesOf,
  ratioOf,
  withReasons,
  type Ranked,
  type Similar,
} from "./similarity";

/**
 * similarCases (similarity.ts) over a shop index: the same rule and formula, read from the typed
 * columns so that a casting without marks, compared with all 100,000 cases, stays quick. Only
 * cases sharing a defect type are opened to compare where the marks are.
 */
export function similarInIndex(index: ShopIndex, target: IndexedCase, limit = 5): Similar<IndexedCase>[] {
  const t = index.slotOf(target.id)!;
  const mask = target.defectMask;
  const places = placesOf(target.markCodes);
  const { order, slots, defects, process, alloy, family, superheat, degassing, section } = index;
  const top: Ranked<IndexedCase>[] = [];
  const probe: Ranked<IndexedCase> = { doc: target, similarity: 0, alike: 0, teaches: 0 };
  for (let pos = 0; pos < order.length; pos++) {
    const s = order[pos];
    const dm = defects[s];
    if (s === t || (mask && !(dm & mask))) continue;
    let same = 0;
    if (mask & dm)
      for (const code of slots[s]!.markCodes) if ((places[code >> 4] >> (code & 15)) & 1) same |= 1 << (code >> 4);
    const conditions = conditionShare(
      process[s] === process[t],
      alloy[s] === alloy[t],
      family[s] === family[t],
      superheat[s] - superheat[t],
      degassing[t] !== 0 && degassing[s] === degassing[t],
      ratioOf(section[t], section[s]),
    );
    probe.doc = slots[s]!;
    probe.similarity = likenessOf(defectShare(mask, dm, same), conditions);
    probe.alike = probe.similarity >= ALIKE_MIN ? 1 : 0;
    probe.teaches = index.teaches[s];
    keepBest(top, probe, limit);
  }
  return withReasons(target, top);
}
