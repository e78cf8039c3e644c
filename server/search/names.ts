/** Small shared pieces of the shop index: interned names, outcome codes, day numbers. */
export const OUTCOME_CODES = ["", "good", "rework", "scrap"] as const;
export const dayNumber = (isoDay: string) => Math.floor(Date.parse(`${isoDay}T00:00:00Z`) / 86_400_000);

/** Interns names as small numbers (0 is "none"), each with the label first seen for it. */
export class Names {
  readonly list: string[] = [""];
  readonly labels: string[] = [""];
  private ids = new Map<string, number>([["", 0]]);
  id(name: string | null | undefined, label?: string): number {
    if (!name) return 0;
    let id = this.ids.get(name);
    if (id === undefined) {
      this.ids.set(name, (id = this.list.push(name) - 1));
      this.labels[id] = label ?? name;
    }
    return id;
  }
  find(name: string): number | undefined {
    return this.ids.get(name);
  }
}
