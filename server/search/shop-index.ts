import { PROCESSES } from "../../rules/case";
import { byDateDesc, type CaseDoc } from "./case-doc";
import { FuzzyIndex, unitsOf } from "./fuzzy";
import { dayNumber, Names, OUTCOME_CODES } from "./names";
import { teaches } from "./similarity";

/**
 * One shop's cases in memory, laid out for a scan of 100,000 in a few milliseconds: each case has
 * a slot; what the filters read sits in typed columns by slot (alloys, causes and people as small
 * numbers), and each distinct word or phrase lists the slots holding it, so a text query looks
 * only at cases that contain every query word. `order` is the slots newest pour first.
 */
export type IndexedCase = CaseDoc;
/**
 * Every case starts from this one class and gets its fields in one order, so all share a hidden
 * class. (Built with `{ ...doc }` each had its own, and every property read was ~50x slower.)
 */
class CaseRecord {}
const indexed = (doc: CaseDoc): IndexedCase => Object.assign(new CaseRecord(), doc);

export class ShopIndex {
  readonly fuzzy = new FuzzyIndex();
  readonly alloys = new Names();
  readonly causes = new Names();
  readonly people = new Names();
  readonly families = new Names();
  readonly degassings = new Names();
  /** By slot; a slot whose case changed or went is left empty until the next rebuild. */
  slots: (IndexedCase | undefined)[] = [];
  order = new Int32Array(0);
  dead = 0;
  defects = new Int32Array(0);
  day = new Int32Array(0);
  process = new Uint8Array(0);
  outcome = new Uint8Array(0);
  alloy = new Uint16Array(0);
  cause = new Int32Array(0);
  person = new Uint16Array(0);
  /** For "cases like this one" (similar-scan.ts): unknown numbers are NaN. */
  family = new Uint8Array(0);
  degassing = new Uint8Array(0);
  superheat = new Float64Array(0);
  section = new Float64Array(0);
  teaches = new Uint8Array(0);
  /** Slots holding each unit (fuzzy.ts), by unit id. */
  postings: number[][] = [];
  /** Every case compiled for the fuzzy search (fuzzy.ts), one after another; `start` by slot. */
  compiled = new Int32Array(0);
  start = new Int32Array(0);
  private compiledLength = 0;
  private bySlotOf = new Map<number, number>();

  private scratchSpace = { hit: new Int32Array(0), found: new Int32Array(0), scores: new Float64Array(0) };
  /**
   * Work arrays for one scan, reused by the next (a scan runs without awaiting, so no two overlap):
   * allocating 1.6 MB per search at 100,000 cases showed up as garbage-collection pauses.
   */
  scratch() {
    const n = this.slots.length;
    if (this.scratchSpace.hit.length < n) {
      const size = Math.ceil(n * 1.25);
      this.scratchSpace = { hit: new Int32Array(size), found: new Int32Array(size), scores: new Float64Array(size) };
    }
    return this.scratchSpace;
  }

  slotOf(castingId: number): number | undefined {
    return this.bySlotOf.get(castingId);
  }

  /** Slots are given newest pour first, so the scan in date order reads memory front to back. */
  constructor(docs: CaseDoc[]) {
    this.replace([], [...docs].sort(byDateDesc));
  }

  get size() {
    return this.order.length;
  }

  /** The cases, newest pour first (a new array: for compacting and the bench, not the scan). */
  live(): IndexedCase[] {
    return Array.from(this.order, (s) => this.slots[s]!);
  }

  get(castingId: number): IndexedCase | undefined {
    const slot = this.bySlotOf.get(castingId);
    return slot === undefined ? undefined : this.slots[slot];
  }

  /** Drops the castings `ids` and adds `docs` (those of them that still exist). */
  replace(ids: number[], docs: CaseDoc[]) {
    for (const id of ids) {
      const slot = this.bySlotOf.get(id);
      if (slot === undefined) continue;
      this.fuzzy.release(this.slots[slot]!.fields);
      this.slots[slot] = undefined;
      this.bySlotOf.delete(id);
      this.dead++;
    }
    this.grow(this.slots.length + docs.length);
    const added: number[] = [];
    for (const doc of docs) {
      const c = indexed(doc);
      const slot = this.slots.push(c) - 1;
      const record = this.fuzzy.compile(doc.fields);
      this.start[slot] = this.append(record);
      this.bySlotOf.set(c.id, slot);
      this.defects[slot] = c.defectMask;
      this.day[slot] = dayNumber(c.pouredOn);
      this.process[slot] = PROCESSES.indexOf(c.process);
      this.outcome[slot] = Math.max(0, OUTCOME_CODES.indexOf(c.outcome ?? ""));
      this.alloy[slot] = this.alloys.id(c.alloyKey, c.alloy);
      this.cause[slot] = this.causes.id(c.cause?.id, c.cause?.title);
      this.person[slot] = this.people.id(c.createdBy);
      this.family[slot] = this.families.id(c.alloyFamily);
      this.degassing[slot] = this.degassings.id(c.degassing);
      this.superheat[slot] = c.superheatC ?? NaN;
      this.section[slot] = c.minSectionMm ?? NaN;
      this.teaches[slot] = teaches(c);
      for (const u of unitsOf(record)) (this.postings[u] ??= []).push(slot);
      added.push(slot);
    }
    const bySlot = (a: number, b: number) => byDateDesc(this.slots[a]!, this.slots[b]!);
    added.sort(bySlot);
    // Merge the new slots into the order: re-sorting 100,000 for a handful would waste time.
    let kept = this.order;
    if (ids.length) {
      const live = new Int32Array(kept.length);
      let n = 0;
      for (const s of kept) if (this.slots[s]) live[n++] = s;
      kept = live.subarray(0, n);
    }
    const merged = new Int32Array(kept.length + added.length);
    for (let i = 0, j = 0, k = 0; k < merged.length; k++) {
      merged[k] = j >= added.length || (i < kept.length && bySlot(kept[i], added[j]) <= 0) ? kept[i++] : added[j++];
    }
    this.order = merged;
  }

  private append(record: Int32Array): number {
    const at = this.compiledLength;
    if (at + record.length > this.compiled.length) {
      const bigger = new Int32Array(Math.max(1 << 16, Math.ceil((at + record.length) * 1.5)));
      bigger.set(this.compiled.subarray(0, at));
      this.compiled = bigger;
    }
    this.compiled.set(record, at);
    this.compiledLength += record.length;
    return at;
  }

  private grow(n: number) {
    if (n <= this.defects.length) return;
    const size = Math.max(1024, Math.ceil(n * 1.25));
    const more = <T extends Int32Array | Uint16Array | Uint8Array | Float64Array>(a: T, make: (n: number) => T) => {
      const b = make(size);
      b.set(a);
      return b;
    };
    this.defects = more(this.defects, (k) => new Int32Array(k));
    this.day = more(this.day, (k) => new Int32Array(k));
    this.process = more(this.process, (k) => new Uint8Array(k));
    this.outcome = more(this.outcome, (k) => new Uint8Array(k));
    this.alloy = more(this.alloy, (k) => new Uint16Array(k));
    this.cause = more(this.cause, (k) => new Int32Array(k));
    this.start = more(this.start, (k) => new Int32Array(k));
    this.family = more(this.family, (k) => new Uint8Array(k));
    this.degassing = more(this.degassing, (k) => new Uint8Array(k));
    this.superheat = more(this.superheat, (k) => new Float64Array(k));
    this.section = more(this.section, (k) => new Float64Array(k));
    this.teaches = more(this.teaches, (k) => new Uint8Array(k));
    this.person = more(this.person, (k) => new Uint16Array(k));
  }
}
