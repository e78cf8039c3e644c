import { z } from "zod";
import { PROCESSES } from "../rules/case";

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
