import { LRUCache } from "lru-cache";
import { CHANGE_LOG_KEEP_MS, changesSince, loadCases, pruneChangeLog } from "./loader";
import { ShopIndex } from "./shop-index";

/**
 * Each shop's index (shop-index.ts), kept in memory. Before every search the shop's entry asks the
 * change log what was written since it last looked (one indexed lookup) and reloads just those
 * castings; a long silence or a large batch of changes rebuilds it from the database instead.
 */
/** A patch larger than this (or than 5 % of the shop) is slower than a rebuild. */
const PATCH_MAX = 500;
/** Shops kept in memory at once; a 100,000-case shop takes roughly 200 MB. */
const SHOPS_MAX = 8;

/** At most one refresh per shop at a time; a request arriving meanwhile waits for the next one. */
class Entry {
  private index?: ShopIndex;
  /** The change log is read from this transaction id on; rows already applied are `seen`. */
  private xmin = 0;
  private seen = new Set<number>();
  private checkedAt = 0;
  private running: Promise<ShopIndex> | null = null;
  private queued: Promise<ShopIndex> | null = null;

  constructor(private readonly shopId: string) {}

  current(): Promise<ShopIndex> {
    if (!this.running) {
      this.running = this.refresh().finally(() => (this.running = null));
      return this.running;
    }
    // The running refresh may have looked before this request's own writes: wait for a fresh look.
    this.queued ??= this.running
      .catch(() => undefined)
      .then(() => {
        this.queued = null;
        return this.current();
      });
    return this.queued;
  }

  private async refresh(): Promise<ShopIndex> {
    const index = this.index;
    if (!index || Date.now() - this.checkedAt > CHANGE_LOG_KEEP_MS / 2) return this.rebuild();
    const { xmin, changes } = await changesSince(this.shopId, this.xmin);
    const ids = [...new Set(changes.filter((c) => !this.seen.has(c.id)).map((c) => c.castingId))];
    if (ids.length > Math.max(PATCH_MAX, index.size / 20)) return this.rebuild();
    if (ids.length) index.replace(ids, (await loadCases(this.shopId, ids)).docs);
    // Slots of changed cases stay empty until compacted; compacting needs no database.
    if (index.dead > Math.max(1000, index.size / 4)) this.index = new ShopIndex(index.live());
    this.xmin = xmin;
    this.seen = new Set(changes.map((c) => c.id));
    this.checkedAt = Date.now();
    return this.index!;
  }

  private async rebuild(): Promise<ShopIndex> {
    const loaded = await loadCases(this.shopId);
    this.index = new ShopIndex(loaded.docs);
    this.xmin = loaded.xmin;
    this.seen = new Set(loaded.seen);
    this.checkedAt = Date.now();
    return this.index;
  }
}

const entries = new LRUCache<string, Entry>({ max: SHOPS_MAX });
let prunedAt = 0;

/** The shop's index, brought up to date with every write committed before this call. */
export function shopIndex(shopId: string): Promise<ShopIndex> {
  let entry = entries.get(shopId);
  if (!entry) entries.set(shopId, (entry = new Entry(shopId)));
  if (Date.now() - prunedAt > 3600_000) {
    prunedAt = Date.now();
    pruneChangeLog().catch((err) => console.error("search change log prune failed", err));
  }
  return entry.current();
}

/** For the bench: forget every shop, so the next search builds from the database. */
export const forgetShopIndexes = () => entries.clear();
