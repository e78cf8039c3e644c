import { boolean, serial, text, timestamp } from "drizzle-orm/pg-core/columns";
import { index } from "drizzle-orm/pg-core/indexes";
import { pgTable } from "drizzle-orm/pg-core/table";
import { organization, user } from "./auth-schema";

/**
 * Every change to who belongs to a shop, in the order it happened: invitations sent, re-sent and
 * cancelled, people joining, role changes, removals, ownership handed on, people leaving. Rows are
 * only added. Names and e-mails are copied in so the record still reads after someone has left.
 */
export const memberChanges = pgTable(
  "member_changes",
  {
    id: serial("id").primaryKey(),
    shopId: text("shop_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    /** Who made the change (null once their account is gone). */
    actorId: text("actor_id").references(() => user.id, { onDelete: "set null" }),
    actorName: text("actor_name").notNull(),
    /** invited | invitation-resent | invitation-cancelled | joined | role-changed | removed | ownership-transferred | left */
    action: text("action").notNull(),
    /** Whom it concerned, by e-mail (an invitation may not have an account behind it). */
    subjectEmail: text("subject_email").notNull(),
    /** The role given or taken, "mentor -> caster" for a change. */
    detail: text("detail"),
    createdAt: timestamp("created_at", { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [index("member_changes_shop_idx").on(t.shopId, t.createdAt)],
);

/** Which e-mail notices a person wants; no row means all of them. */
export const noticeSettings = pgTable("notice_settings", {
  userId: text("user_id")
    .primaryKey()
    .references(() => user.id, { onDelete: "cascade" }),
  /** Mentors and owners: a caster asked for a review. */
  reviewRequested: boolean("review_requested").default(true).notNull(),
  /** The person whose casting it is: a mentor confirmed or corrected its cause. */
  causeConfirmed: boolean("cause_confirmed").default(true).notNull(),
  updatedAt: timestamp("updated_at", { withTimezone: true }).defaultNow().notNull(),
});
