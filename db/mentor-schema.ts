import { sql } from "drizzle-orm";
import { boolean, integer, jsonb, serial, text, timestamp } from "drizzle-orm/pg-core/columns";
import { index, uniqueIndex } from "drizzle-orm/pg-core/indexes";
import { primaryKey } from "drizzle-orm/pg-core/primary-keys";
import { pgTable } from "drizzle-orm/pg-core/table";
import { unique } from "drizzle-orm/pg-core/unique-constraint";
import type { KbRule } from "../rules/kb-schema";
import { organization, user } from "./auth-schema";
import { ruleStatusEnum, workedEnum } from "./enums";
import { castings, rowVersionColumn } from "./notebook-schema";

/**
 * What the shop learns from its castings (core loop step 5 and the rulebook): review requests,
 * confirmed causes, fixes tried with the casting that followed, and the shop's own rules. Rows are
 * only ever added (a new confirmation, version or switch row), so every change keeps who and when.
 */
const shopId = () =>
  text("shop_id")
    .notNull()
    .references(() => organization.id, { onDelete: "cascade" });
const createdBy = () =>
  text("created_by")
    .notNull()
    .references(() => user.id);
const createdAt = () => timestamp("created_at", { withTimezone: true }).defaultNow().notNull();
const castingId = () =>
  integer("casting_id")
    .notNull()
    .references(() => castings.id, { onDelete: "cascade" });

/** A caster asks a mentor to look at a casting; answered when a mentor confirms its cause. */
export const reviewRequests = pgTable(
  "review_requests",
  {
    id: serial("id").primaryKey(),
    shopId: shopId(),
    castingId: castingId(),
    note: text("note"),
    createdBy: createdBy(),
    createdAt: createdAt(),
    answeredAt: timestamp("answered_at", { withTimezone: true }),
    answeredBy: text("answered_by").references(() => user.id),
  },
  (t) => [
    index("review_requests_queue_idx").on(t.shopId, t.answeredAt, t.createdAt),
    index("review_requests_casting_idx").on(t.castingId),
    // One open request per casting, however many people click at once (a lock takes no rows when none is open).
    uniqueIndex("review_requests_one_open_idx")
      .on(t.castingId)
      .where(sql`${t.answeredAt} is null`),
  ],
);

/**
 * A mentor's word on what caused a casting's defects: a cause id (built-in or the shop's) or, when
 * the rulebook has no such cause, its name in words. The newest row per casting counts.
 */
export const confirmations = pgTable(
  "confirmations",
  {
    id: serial("id").primaryKey(),
    shopId: shopId(),
    castingId: castingId(),
    causeId: text("cause_id"),
    causeText: text("cause_text"),
    note: text("note"),
    createdBy: createdBy(),
    createdAt: createdAt(),
  },
  (t) => [index("confirmations_shop_casting_idx").on(t.shopId, t.castingId, t.id)],
);

/** A fix tried after a casting, the next casting of the same part it was tried on, and whether it worked. */
export const fixesTried = pgTable(
  "fixes_tried",
  {
    id: serial("id").primaryKey(),
    shopId: shopId(),
    castingId: castingId(),
    fix: text("fix").notNull(),
    nextCastingId: integer("next_casting_id").references(() => castings.id, { onDelete: "set null" }),
    /** yes | partly | no; null until judged. */
    worked: workedEnum("worked"),
    createdBy: createdBy(),
    createdAt: createdAt(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).defaultNow().notNull(),
    version: rowVersionColumn(),
    updatedBy: text("updated_by")
      .notNull()
      .references(() => user.id),
  },
  (t) => [index("fixes_tried_casting_idx").on(t.castingId), index("fixes_tried_next_idx").on(t.nextCastingId)],
);

/**
 * A fix to try that someone ticked on a casting's likely causes, kept with the casting so the next
 * visit (and "record a fix") sees it. Ticking off removes the row: a tick is a note, not a record.
 */
export const fixTicks = pgTable(
  "fix_ticks",
  {
    shopId: shopId(),
    castingId: castingId(),
    fix: text("fix").notNull(),
    createdBy: createdBy(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ name: "fix_ticks_pk", columns: [t.castingId, t.fix] })],
);

/**
 * When the author of a casting last read the mentors' answer on it: a confirmation newer than this is
 * a new answer, marked on the author's lists until they open the casting.
 */
export const answerSeen = pgTable(
  "answer_seen",
  {
    shopId: shopId(),
    castingId: castingId(),
    userId: text("user_id")
      .notNull()
      .references(() => user.id, { onDelete: "cascade" }),
    seenAt: timestamp("seen_at", { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [primaryKey({ name: "answer_seen_pk", columns: [t.castingId, t.userId] })],
);

/** A rule written in the shop; its rule id in the engine is `shop-<id>`. Its content lives in versions. */
export const shopRules = pgTable("shop_rules", {
  id: serial("id").primaryKey(),
  shopId: shopId(),
  createdBy: createdBy(),
  createdAt: createdAt(),
});

/** Every save, publish and retire is a new row: the rule as json-rules-engine reads it, and its state. */
export const shopRuleVersions = pgTable(
  "shop_rule_versions",
  {
    id: serial("id").primaryKey(),
    shopId: shopId(),
    shopRuleId: integer("shop_rule_id")
      .notNull()
      .references(() => shopRules.id, { onDelete: "cascade" }),
    version: integer("version").notNull(),
    status: ruleStatusEnum("status").notNull(),
    rule: jsonb("rule").$type<KbRule>().notNull(),
    createdBy: createdBy(),
    createdAt: createdAt(),
  },
  (t) => [
    unique("shop_rule_versions_uq").on(t.shopRuleId, t.version),
    index("shop_rule_versions_shop_idx").on(t.shopId),
  ],
);

/** Causes a shop named in its rules, beside the built-in ones; ids start with "shop-". */
export const shopCauses = pgTable(
  "shop_causes",
  {
    shopId: shopId(),
    causeId: text("cause_id").notNull(),
    title: text("title").notNull(),
    fixes: jsonb("fixes").$type<string[]>().notNull(),
    createdBy: createdBy(),
    createdAt: createdAt(),
  },
  (t) => [primaryKey({ name: "shop_causes_pk", columns: [t.shopId, t.causeId] })],
);

/** A shop switching a built-in rule off (or back on); the newest row per rule counts. */
export const ruleSwitches = pgTable(
  "rule_switches",
  {
    id: serial("id").primaryKey(),
    shopId: shopId(),
    ruleId: text("rule_id").notNull(),
    off: boolean("off").notNull(),
    createdBy: createdBy(),
    createdAt: createdAt(),
  },
  (t) => [index("rule_switches_shop_rule_idx").on(t.shopId, t.ruleId, t.id)],
);
