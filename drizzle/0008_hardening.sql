-- Keep the oldest open request of a casting where simultaneous clicks made several, so the index can be built.
DELETE FROM "review_requests" r USING "review_requests" o WHERE r."casting_id" = o."casting_id" AND r."answered_at" IS NULL AND o."answered_at" IS NULL AND r."id" > o."id";--> statement-breakpoint
CREATE UNIQUE INDEX "review_requests_one_open_idx" ON "review_requests" USING btree ("casting_id") WHERE "review_requests"."answered_at" is null;
