import { formatDay } from "./dates";
import { DEFECTS, LOCATION_LABELS } from "./defects";
import { OUTCOME_LABELS } from "./labels";
import type { MeltSummary } from "./notebook-schemas";
import type { CastingRef } from "./review-schemas";
import type { CaseSummary } from "./search-schemas";

/** Short lines that name a casting, a melt's castings, a case's defects and its cause, the same on every screen. */
export const castingHref = (c: Pick<CaseSummary, "id" | "meltId">) => `/melts/${c.meltId}/castings/${c.id}` as const;
/** The defects as the search reads them, so marked and unmarked results look alike. */
export const defectsLine = (c: Pick<CaseSummary, "defects">) =>
  [...new Set(c.defects.map((d) => `${DEFECTS[d.type].label} (${LOCATION_LABELS[d.location]})`))].join("; ") ||
  "no defects marked";
export const causeLine = (c: Pick<CaseSummary, "cause" | "fixWorked">) =>
  c.cause
    ? `${c.cause.confirmed ? "Confirmed" : "Likely"}: ${c.cause.title}${c.fixWorked === "yes" ? " · the fix worked" : ""}`
    : "";
export const castingWords = (c: CastingRef) =>
  `${c.partName} · ${formatDay(c.pouredOn)}${c.outcome ? ` (${OUTCOME_LABELS[c.outcome]})` : ""}`;
export const castingsLine = (m: Pick<MeltSummary, "castingCount" | "scrapCount">) =>
  m.castingCount === 0
    ? "no castings yet"
    : `${m.castingCount} casting${m.castingCount === 1 ? "" : "s"}${m.scrapCount ? `, ${m.scrapCount} scrap` : ""}`;
