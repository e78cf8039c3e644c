DROP INDEX "search_words_nearest_idx";--> statement-breakpoint
CREATE INDEX "search_words_nearest_idx" ON "search_words" USING gist ("shop_id","word" gist_trgm_ops(siglen=128));