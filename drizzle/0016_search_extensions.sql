-- Custom migration (drizzle-kit generate --custom): the casebook search moves into PostgreSQL.
-- pg_trgm (trigram index of each shop's words, for typos), fuzzystrmatch (levenshtein, the
-- number of slips a widened word may carry) and btree_gist ship with Debian's PostgreSQL; all
-- three are trusted extensions, so the database owner may create them.
CREATE EXTENSION IF NOT EXISTS pg_trgm;
--> statement-breakpoint
CREATE EXTENSION IF NOT EXISTS fuzzystrmatch;
--> statement-breakpoint
-- btree_gist: shop_id and the trigram of the word in one GiST index (nearest words of one shop).
CREATE EXTENSION IF NOT EXISTS btree_gist;
--> statement-breakpoint
-- The in-process index and its change log go: their triggers first, then (next migration) the table.
DROP TRIGGER IF EXISTS search_castings_ins ON castings;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_castings_upd ON castings;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_castings_del ON castings;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_melts_upd ON melts;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_alloys_upd ON alloys;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_defect_marks_ins ON defect_marks;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_defect_marks_upd ON defect_marks;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_defect_marks_del ON defect_marks;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_comments_ins ON comments;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_comments_upd ON comments;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_comments_del ON comments;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_diagnosis_snapshots_ins ON diagnosis_snapshots;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_diagnosis_snapshots_upd ON diagnosis_snapshots;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_diagnosis_snapshots_del ON diagnosis_snapshots;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_confirmations_ins ON confirmations;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_confirmations_upd ON confirmations;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_confirmations_del ON confirmations;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_fixes_tried_ins ON fixes_tried;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_fixes_tried_upd ON fixes_tried;
--> statement-breakpoint
DROP TRIGGER IF EXISTS search_fixes_tried_del ON fixes_tried;
--> statement-breakpoint
DROP FUNCTION IF EXISTS search_log_castings();
--> statement-breakpoint
DROP FUNCTION IF EXISTS search_log_casting_rows();
--> statement-breakpoint
DROP FUNCTION IF EXISTS search_log_melts();
--> statement-breakpoint
DROP FUNCTION IF EXISTS search_log_alloys();
