import { integer, text } from "drizzle-orm/pg-core/columns";
import { index } from "drizzle-orm/pg-core/indexes";
import { primaryKey } from "drizzle-orm/pg-core/primary-keys";
import { pgTable } from "drizzle-orm/pg-core/table";
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
 * `calibration_tallies`: per rule set, how many of those rows there are (`kind` "case"), how many a
 * rule fired on ("fired") and agreed with ("agreed"), how many a cause was suggested in ("suggested")
 * and was right in ("right") (rules/calibration.ts); kept by a trigger on `calibration_cases` in
 * the same transaction, so reading the shop's calibration reads at most (rules + causes) x causes
 * tallies, however many cases it has.
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
    /**
     * The rules that fired (every rule, switched off or not), those of them that agreed with the
     * confirmed cause, and the causes the rules in use suggested: what the case adds to the tallies.
     */
    fired: text("fired").array(),
    agreed: text("agreed").array(),
    suggested: text("suggested").array(),
    /**
     * The firings the rules above were read from, kept per rule version (`firingKey`, a rule's id and
     * a hash of what decides whether it fires), with the key set they were worked out against
     * (`fired_with`, a row of calibration_rule_keys): after a publish only the rules whose key is
     * new are run on the case, and a switch off or on runs nothing.
     */
    firedKeys: text("fired_keys").array(),
    firedWith: text("fired_with"),
    ruleSetVersion: text("rule_set_version").notNull().default(""),
    changes: integer("changes").notNull().default(0),
    computed: integer("computed").notNull().default(-1),
  },
  (t) => [
    index("calibration_cases_shop_idx").on(t.shopId, t.ruleSetVersion),
    index("calibration_cases_fired_with_idx").on(t.shopId, t.firedWith),
  ],
);

/** The firing keys of a shop's rules (every rule, switched off or not) at one set of rules: `fired_with`. */
export const calibrationRuleKeys = pgTable(
  "calibration_rule_keys",
  {
    shopId: text("shop_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    firingVersion: text("firing_version").notNull(),
    keys: text("keys").array().notNull(),
  },
  (t) => [primaryKey({ name: "calibration_rule_keys_pk", columns: [t.shopId, t.firingVersion] })],
);

export const calibrationTallies = pgTable(
  "calibration_tallies",
  {
    shopId: text("shop_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    ruleSetVersion: text("rule_set_version").notNull(),
    kind: text("kind", { enum: ["case", "fired", "agreed", "suggested", "right"] }).notNull(),
    /** A rule's id (fired, agreed), a cause's (suggested, right), "" for a case. */
    item: text("item").notNull(),
    cases: integer("cases").notNull(),
  },
  (t) => [primaryKey({ name: "calibration_tallies_pk", columns: [t.shopId, t.ruleSetVersion, t.kind, t.item] })],
);
