/**
 * How a casting came out, and whether a fix tried on it worked. The tables' enums (db/enums.ts) and
 * the schemas built from those tables both read these lists, so this file imports nothing: a table
 * module that imported a schema module which imports the table would be a cycle.
 */
export const OUTCOMES = ["good", "rework", "scrap"] as const;
export type Outcome = (typeof OUTCOMES)[number];

export const WORKED = ["yes", "partly", "no"] as const;
export type Worked = (typeof WORKED)[number];
