import { index, integer, pgTable, primaryKey, text } from "drizzle-orm/pg-core";
import { organization } from "./auth-schema";
import { castings } from "./notebook-schema";

/**
 * The shop's calibration (rules/calibration.ts) kept up to date case by case instead of worked out
 * again over every confirmed case (server/rulebook/calibration.ts).
 *
 * `calibration_cases`: one row per confirmed casting: the confirmed cause where it is a rulebook cause
 * (else null: it counts as neither a hit nor a miss) and the rules that fired on the case (null when
 * the casting has no marks or its values cannot be read as a case), computed with the rule set
 * `rule_set_version`. Triggers (drizzle/*_calibration-triggers.sql) raise `changes` in the transaction
 * of every write that changes what the row says (a confirmation, the casting, its melt, marks or
 * alloy) and add the row for a newly confirmed casting; a row whose `computed` differs from `changes`,
 * or whose rule set is not the shop's current one, is worked out again for that casting alone.
 *
 * `calibration_tallies`: how many of those rows hold each (rule set, cause, fired rules), kept by a
 * trigger on `calibration_cases` in the same transaction, so reading the shop's calibration reads a
 * few dozen tallies, however many cases it has.
 */
export const calibrationCases = pgTable(
  "calibration_cases",
  {
    castingId: integer("casting_id")
      .primaryKey()
      .references(() => castings.id, { onDelete: "cascade" }),
    shopId: text("shop_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    causeId: text("cause_id"),
    /** Rule ids in sorted order, so equal sets are equal arrays and tally together. */
    fired: text("fired").array(),
    ruleSetVersion: text("rule_set_version").notNull().default(""),
    changes: integer("changes").notNull().default(0),
    computed: integer("computed").notNull().default(-1),
  },
  (t) => [index("calibration_cases_shop_idx").on(t.shopId, t.ruleSetVersion)],
);

export const calibrationTallies = pgTable(
  "calibration_tallies",
  {
    shopId: text("shop_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    ruleSetVersion: text("rule_set_version").notNull(),
    causeId: text("cause_id").notNull(),
    fired: text("fired").array().notNull(),
    cases: integer("cases").notNull(),
  },
  (t) => [primaryKey({ name: "calibration_tallies_pk", columns: [t.shopId, t.ruleSetVersion, t.causeId, t.fired] })],
);
