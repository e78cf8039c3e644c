ALTER TABLE "castings" ADD COLUMN "archived_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "castings" ADD COLUMN "archived_by" text;--> statement-breakpoint
ALTER TABLE "castings" ADD COLUMN "idempotency_key" text;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "archived_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "archived_by" text;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "idempotency_key" text;--> statement-breakpoint
ALTER TABLE "castings" ADD CONSTRAINT "castings_archived_by_user_id_fk" FOREIGN KEY ("archived_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "melts" ADD CONSTRAINT "melts_archived_by_user_id_fk" FOREIGN KEY ("archived_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "castings" ADD CONSTRAINT "castings_shop_idempotency_uq" UNIQUE("shop_id","idempotency_key");--> statement-breakpoint
ALTER TABLE "melts" ADD CONSTRAINT "melts_shop_idempotency_uq" UNIQUE("shop_id","idempotency_key");