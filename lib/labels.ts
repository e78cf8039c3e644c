import type { Process } from "../rules/case";

/** Plain words for stored codes, shown wherever a person reads them. */
export const PROCESS_LABELS: Record<Process, string> = {
  "green-sand": "green sand",
  "no-bake-sand": "no-bake sand",
  "lost-foam": "lost foam",
  investment: "investment",
  plaster: "plaster",
  "permanent-mould": "permanent mould",
};
