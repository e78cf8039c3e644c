/**
 * How a casting came out at shakeout, and whether a fix tried on it worked: the trade's words, kept
 * with the other fixed lists of rules/ so that the tables' enums (db/enums.ts) read them from the
 * bottom layer, and the schemas in lib/ built from those tables read them from here too.
 */
export const OUTCOMES = ["good", "rework", "scrap"] as const;
export type Outcome = (typeof OUTCOMES)[number];

export const WORKED = ["yes", "partly", "no"] as const;
export type Worked = (typeof WORKED)[number];
