/**
 * What changed between the case a diagnosis read and the case the stored casting gives now: the
 * contract's top-level fields whose values differ ("defects" for the marks). A field the diagnosis does
 * not read is not in the case, so changing it (a note, the part name, the furnace) changes nothing here.
 */
type CaseLike = Record<string, unknown>;

/** JSON with keys sorted: the stored input went through jsonb, which does not keep key order. */
function canonical(v: unknown): string {
  if (Array.isArray(v)) return `[${v.map(canonical).join(",")}]`;
  if (v && typeof v === "object")
    return `{${Object.keys(v)
      .filter((k) => (v as CaseLike)[k] !== undefined)
      .sort()
      .map((k) => `${JSON.stringify(k)}:${canonical((v as CaseLike)[k])}`)
      .join(",")}}`;
  return JSON.stringify(v ?? null);
}

/** Fields first in the order of the newer case, then those only the older one had. */
export function changedCaseFields(read: CaseLike, now: CaseLike): string[] {
  const keys = [...new Set([...Object.keys(now), ...Object.keys(read)])];
  return keys.filter((k) => canonical(read[k]) !== canonical(now[k]));
}
