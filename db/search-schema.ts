import {
  bigint,
  boolean,
  customType,
  date,
  doublePrecision,
  integer,
  jsonb,
  text,
  timestamp,
} from "drizzle-orm/pg-core/columns";
import { index } from "drizzle-orm/pg-core/indexes";
import { primaryKey } from "drizzle-orm/pg-core/primary-keys";
import { pgTable } from "drizzle-orm/pg-core/table";
import { organization } from "./auth-schema";
import { alloyFamilyEnum, defectTypeEnum, degassingEnum, outcomeEnum, processEnum, workedEnum } from "./enums";
import { castings } from "./notebook-schema";

/**
 * The casebook search, in PostgreSQL. One row per casting (`search_documents`), rebuilt by the
 * function `search_refresh(ids)` (drizzle/*_search-documents-sql.sql) that triggers on the
 * notebook's tables call in the transaction of the write itself. Triggers rather than the service
 * layer: every write path (castings, melts, marks, comments, diagnoses, confirmations, fixes,
 * alloys, shop causes) is covered without each service remembering to, and the bench measures
 * the cost of the two side by side (scripts/bench-search.ts, "keeping documents current").
 */
const tsvector = customType<{ data: string }>({ dataType: () => "tsvector" });

export const searchDocuments = pgTable(
  "search_documents",
  {
    castingId: integer("casting_id")
      .primaryKey()
      .references(() => castings.id, { onDelete: "cascade" }),
    shopId: text("shop_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    meltId: integer("melt_id").notNull(),
    partName: text("part_name").notNull(),
    pattern: text("pattern"),
    pouredOn: date("poured_on", { mode: "string" }).notNull(),
    alloy: text("alloy").notNull(),
    /** The alloy table's key (upper case, no spaces): what the alloy filter compares. */
    alloyKey: text("alloy_key").notNull(),
    alloyFamily: alloyFamilyEnum("alloy_family").notNull(),
    process: processEnum("process").notNull(),
    degassing: degassingEnum("degassing"),
    outcome: outcomeEnum("outcome"),
    /** Each defect type once, for the filter and its chip counts. */
    defectTypes: defectTypeEnum("defect_types").array().notNull(),
    /** The marks in the order they were made: [{ type, location, severity }]. */
    marks: jsonb("marks").$type<{ type: string; location: string; severity: number }[]>().notNull(),
    /** Each mark as "type@location", for "cases like this one". */
    markPlaces: text("mark_places").array().notNull(),
    /** The mentor's confirmed cause, else the latest diagnosis's first cause. */
    causeId: text("cause_id"),
    causeTitle: text("cause_title"),
    causeConfirmed: boolean("cause_confirmed").notNull(),
    fixWorked: workedEnum("fix_worked"),
    superheatC: doublePrecision("superheat_c"),
    minSectionMm: doublePrecision("min_section_mm"),
    createdBy: text("created_by").notNull(),
    /** Texts the page's re-ranking and marked words read (the screen's "causes", "notes", "comments"). */
    causesText: text("causes_text").notNull(),
    notesText: text("notes_text").notNull(),
    commentsText: text("comments_text").notNull(),
    /** Every word, weighted: part and defects A, causes and fixes B, conditions C, notes and comments D. */
    document: tsvector("document").notNull(),
    refreshedAt: timestamp("refreshed_at", { withTimezone: true }).defaultNow().notNull(),
  },
  (t) => [
    index("search_documents_shop_date_idx").on(t.shopId, t.pouredOn.desc(), t.castingId.desc()),
    index("search_documents_document_idx").using("gin", t.document),
    index("search_documents_defects_idx").using("gin", t.defectTypes),
    // A chip filter that leaves few cases (one cause, one alloy) reads its matches newest first here
    // instead of walking the whole shop's date index to find them (server/search/service.ts).
    index("search_documents_shop_cause_idx").on(t.shopId, t.causeId, t.pouredOn.desc(), t.castingId.desc()),
    index("search_documents_shop_alloy_idx").on(t.shopId, t.alloyKey, t.pouredOn.desc(), t.castingId.desc()),
  ],
);

/** Each shop's distinct words, trigram-indexed: a query word is widened to the shop's words like it. */
export const searchWords = pgTable(
  "search_words",
  {
    shopId: text("shop_id")
      .notNull()
      .references(() => organization.id, { onDelete: "cascade" }),
    word: text("word").notNull(),
  },
  (t) => [
    primaryKey({ name: "search_words_pk", columns: [t.shopId, t.word] }),
    // GiST, not GIN: it answers "the nearest words first" (ORDER BY word <-> query LIMIT n) from the
    // index itself, within one shop (btree_gist lets shop_id share the index). Signatures of 128
    // bytes instead of pg_trgm's 12: with 12 most of a 28,000-word vocabulary collides and the walk
    // checks many more words per lookup; at 100,000 cases a four-word query's lookups went from about
    // 33 ms to 23 ms (1024 bytes was slower again: bigger pages). Same operator, same nearest words.
    index("search_words_nearest_idx").using("gist", t.shopId, t.word.op("gist_trgm_ops(siglen=128)")),
  ],
);

/**
 * Each shop's vocabulary version: raised at commit by every transaction that added words to or
 * removed words from `search_words` (a deferred constraint trigger, drizzle/0033_search_versions_triggers.sql), so a
 * server may keep the similar words it found for a query word under (shop, version) and know with
 * one indexed read, on every server, whether they still hold. No row yet means version 0.
 * No foreign key, as shop_revisions: deleting a shop cascades into search_words, whose trigger must
 * not then fail on a row for the shop being deleted.
 */
export const searchVocabularies = pgTable("search_vocabularies", {
  shopId: text("shop_id").primaryKey(),
  version: bigint("version", { mode: "number" }).notNull().default(0),
});

/**
 * Each shop's documents version: raised at commit by every transaction that wrote or removed
 * documents (a deferred constraint trigger, drizzle/0033_search_versions_triggers.sql), so a server may keep a search's answer under
 * (shop, documents version, shop revision) and know with one indexed read, on every server, whether
 * it still holds. No row yet means version 0; no foreign key, as search_vocabularies.
 */
export const searchDocumentVersions = pgTable("search_document_versions", {
  shopId: text("shop_id").primaryKey(),
  version: bigint("version", { mode: "number" }).notNull().default(0),
});

/**
 * The words a person reads for a stored code (lib/defects.ts, lib/labels.ts), so the documents hold
 * "metal in the sand" for metal-penetration. Written by a migration; tests/api/search-labels.test.ts
 * fails when the app's labels and these differ (a changed label needs a migration that updates
 * this table and calls search_refresh for the shop's castings).
 */
export const searchLabels = pgTable(
  "search_labels",
  {
    kind: text("kind").notNull(),
    code: text("code").notNull(),
    words: text("words").notNull(),
  },
  (t) => [primaryKey({ name: "search_labels_pk", columns: [t.kind, t.code] })],
);
