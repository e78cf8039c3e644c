import { z } from "zod";
import { PROCESSES } from "../rules/case";
import { textInUnits } from "./quantity-words";
import type { Units } from "./units";

const day = z.iso.date({ error: "a date as YYYY-MM-DD" });

/** Filters every trend chart takes; all optional. */
export const trendsQuery = z
  .strictObject({
    from: day.optional(),
    to: day.optional(),
    process: z.enum(PROCESSES, { error: `process must be one of: ${PROCESSES.join(", ")}` }).optional(),
    alloy: z.string().trim().min(1).max(40).optional(),
  })
  .refine((q) => !q.from || !q.to || q.from <= q.to, { message: "from is on or before to", path: ["from"] });
export type TrendsQuery = z.infer<typeof trendsQuery>;

/** A bar of a rate chart: castings in the group and how many had the thing counted. */
export type RatePoint = { key: string; castings: number; count: number };
/** A fix as the shop wrote it, how often it was tried and how the next casting came out. */
export type FixPoint = {
  fix: string;
  tried: number;
  worked: number;
  partly: number;
  failed: number;
  notJudged: number;
};
/** A cause mentors confirmed (the newest word per casting), by id, or in words when the rulebook lacks it. */
export type CausePoint = { causeId: string | null; title: string; castings: number };
export type Trends = {
  castings: number;
  defectBySuperheat: RatePoint[];
  defectByProcess: RatePoint[];
  defectByAlloy: RatePoint[];
  scrapByMonth: RatePoint[];
  reworkByMonth: RatePoint[];
  fixes: FixPoint[];
  confirmedCauses: CausePoint[];
};

/** Superheat bands in °C (pour − liquidus); below 40 °C misruns rise in thin walls (common practice). */
export const SUPERHEAT_BANDS_C = [40, 60, 100] as const;
/** The bands as the server names them (server/trends/service.ts), and as templates for a person's units. */
const SUPERHEAT_BAND_TEMPLATES: Record<string, string> = {
  "under 40 °C": "under {40 K}",
  "40-60 °C": "{40-60 K}",
  "60-100 °C": "{60-100 K}",
  "100 °C and over": "{100 K} and over",
};
/** "40-60 °C" -> "72-108 °F" for a °F person: a superheat is a difference, so no +32. */
export const superheatBandInUnits = (key: string, units: Units) =>
  SUPERHEAT_BAND_TEMPLATES[key] ? textInUnits(SUPERHEAT_BAND_TEMPLATES[key], units) : key;
