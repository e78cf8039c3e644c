CREATE TABLE "imported_rows" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"fingerprint" text NOT NULL,
	"casting_id" integer,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "imported_rows" ADD CONSTRAINT "imported_rows_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "imported_rows" ADD CONSTRAINT "imported_rows_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "imported_rows" ADD CONSTRAINT "imported_rows_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "imported_rows_shop_fingerprint_uq" ON "imported_rows" USING btree ("shop_id","fingerprint");--> statement-breakpoint
CREATE INDEX "imported_rows_casting_idx" ON "imported_rows" USING btree ("casting_id");