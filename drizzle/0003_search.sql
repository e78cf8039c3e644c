CREATE TABLE "search_changes" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"casting_id" integer NOT NULL,
	"xid" bigint NOT NULL,
	"logged_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE INDEX "search_changes_shop_xid_idx" ON "search_changes" USING btree ("shop_id","xid");--> statement-breakpoint
CREATE INDEX "search_changes_logged_idx" ON "search_changes" USING btree ("logged_at");