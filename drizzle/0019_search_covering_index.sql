-- Custom migration (drizzle-kit generate --custom; drizzle's schema cannot say INCLUDE): what a
-- search without words (filters, chip counts, the page's keys) and "cases like this one" read, so
-- scanning a whole shop is an index-only scan instead of a walk through every wide document row.
CREATE INDEX "search_documents_shop_cover_idx" ON "search_documents" USING btree ("shop_id", "poured_on" DESC, "casting_id" DESC)
  INCLUDE ("alloy_key", "alloy", "alloy_family", "process", "degassing", "outcome", "cause_id", "cause_confirmed",
    "fix_worked", "superheat_c", "min_section_mm", "defect_types", "mark_places", "created_by");
