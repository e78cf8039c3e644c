-- Custom migration (drizzle-kit generate --custom; drizzle's schema cannot say INCLUDE): what a
-- search without words reads (filters, chip counts, the page's keys), so counting a whole shop's
-- chips is an index-only scan instead of a walk through every wide document row.
CREATE INDEX "search_documents_shop_cover_idx" ON "search_documents" USING btree ("shop_id", "poured_on" DESC, "casting_id" DESC)
  INCLUDE ("alloy_key", "alloy", "process", "outcome", "cause_id", "defect_types", "created_by");
