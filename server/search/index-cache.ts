import { byDateDesc, type CaseDoc } from "./case-doc";
import { FuzzyIndex, type CompiledFields } from "./fuzzy";
import { CHANGE_LOG_KEEP_MS, changesSince, loadCases, pruneChangeLog, type Loaded } from "./loader";

/**
 * Each shop's cases, compiled for the fuzzy search and kept in memory, newest pour first. Before
 * every search the shop's index asks the change log what was written since it last looked (one
 * indexed lookup) and reloads just those castings; a long silence or a large batch of changes
 * rebuilds it instead. The cases never leave the server: a search answers with one page.
 */
export type IndexedCase = CaseDoc & { compiled: CompiledFields };

/** A patch larger than this (or than 5 % of the shop) is slower than a rebuild. */
const PATCH_MAX = 500;
/** Shops kept in memory at once; a 100,000-case shop takes roughly 150 MB. */
const SHOPS_MAX = 8;

export class ShopIndex {
  readonly fuzzy = new FuzzyIndex();
  cases: IndexedCase[] = [];
  private byId = new Map<number, IndexedCase>();
  xmin: number;
  seen: Set<number>;
  checkedAt = Date.now();

  constructor(loaded: Loaded) {
    this.xmin = loaded.xmin;
    this.seen = new Set(loaded.seen);
    this.replace([], loaded.docs);
  }

  get(id: number) {
    return this.byId.get(id);
  }

  /** Drops the castings `ids` and puts back those of `docs` (the ones that still exist), in order. */
  replace(ids: number[], docs: CaseDoc[]) {
    const gone = new Set(ids);
    for (const id of ids) {
      const old = this.byId.get(id);
      if (old) this.fuzzy.release(old.fields);
      this.byId.delete(id);
    }
    const added = docs.map((d) => ({ ...d, compiled: this.fuzzy.compile(d.fields) })).sort(byDateDesc);
    for (const a of added) this.byId.set(a.id, a);
    const kept = gone.size ? this.cases.filter((c) => !gone.has(c.id)) : this.cases;
    // Merge two sorted lists rather than re-sorting 100,000 cases for a handful of new ones.
    const merged: IndexedCase[] = new Array(kept.length + added.length);
    let i = 0;
    let j = 0;
    for (let k = 0; k < merged.length; k++) {
      merged[k] = j >= added.length || (i < kept.length && byDateDesc(kept[i], added[j]) <= 0) ? kept[i++] : added[j++];
    }
    this.cases = merged;
  }
}

/** At most one refresh per shop at a time; a request arriving meanwhile waits for the next one. */
class Entry {
  index?: ShopIndex;
  private running: Promise<ShopIndex> | null = null;
  private queued: Promise<ShopIndex> | null = null;

  constructor(private readonly shopId: string) {}

  current(): Promise<ShopIndex> {
    if (!this.running) {
      this.running = this.refresh().finally(() => (this.running = null));
      return this.running;
    }
    // The running refresh may have looked before this request's own writes: wait for a fresh look.
    this.queued ??= this.running.catch(() => undefined).then(() => {
      this.queued = null;
      return this.current();
    });
    return this.queued;
  }

  private async refresh(): Promise<ShopIndex> {
    const index = this.index;
    if (!index || Date.now() - index.checkedAt > CHANGE_LOG_KEEP_MS / 2) return (this.index = new ShopIndex(await loadCases(this.shopId)));
    const { xmin, changes } = await changesSince(this.shopId, index.xmin);
    const ids = [...new Set(changes.filter((c) => !index.seen.has(c.id)).map((c) => c.castingId))];
    if (ids.length > Math.max(PATCH_MAX, index.cases.length / 20)) return (this.index = new ShopIndex(await loadCases(this.shopId)));
    if (ids.length) index.replace(ids, (await loadCases(this.shopId, ids)).docs);
    index.xmin = xmin;
    index.seen = new Set(changes.map((c) => c.id));
    index.checkedAt = Date.now();
    return index;
  }
}

const entries = new Map<string, Entry>();
let prunedAt = 0;

/** The shop's index, brought up to date with every write committed before this call. */
export function shopIndex(shopId: string): Promise<ShopIndex> {
  let entry = entries.get(shopId);
  if (entry) entries.delete(shopId); // re-inserted below: Map order is least recently used first
  entry ??= new Entry(shopId);
  entries.set(shopId, entry);
  if (entries.size > SHOPS_MAX) entries.delete(entries.keys().next().value!);
  if (Date.now() - prunedAt > 3600_000) {
    prunedAt = Date.now();
    pruneChangeLog().catch((err) => console.error("search change log prune failed", err));
  }
  return entry.current();
}

/** For the bench: forget every shop, so the next search builds from the database. */
export const forgetShopIndexes = () => entries.clear();
