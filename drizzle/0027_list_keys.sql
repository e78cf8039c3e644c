CREATE TABLE "melt_casting_counts" (
	"melt_id" integer PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"poured_on" date NOT NULL,
	"castings" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "melt_casting_counts_castings_ck" CHECK ("melt_casting_counts"."castings" >= 0)
);
--> statement-breakpoint
ALTER TABLE "castings" ADD COLUMN "poured_on" date DEFAULT 'epoch' NOT NULL;--> statement-breakpoint
ALTER TABLE "melt_casting_counts" ADD CONSTRAINT "melt_casting_counts_melt_id_melts_id_fk" FOREIGN KEY ("melt_id") REFERENCES "public"."melts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "melt_casting_counts" ADD CONSTRAINT "melt_casting_counts_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "melt_casting_counts_order_idx" ON "melt_casting_counts" USING btree ("shop_id","castings" DESC NULLS LAST,"poured_on" DESC NULLS LAST,"melt_id" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "castings_shop_poured_idx" ON "castings" USING btree ("shop_id","poured_on","id") WHERE "castings"."archived_at" is null;--> statement-breakpoint
CREATE INDEX "castings_shop_part_lower_idx" ON "castings" USING btree ("shop_id",lower("part_name"),"id" DESC NULLS LAST) WHERE "castings"."archived_at" is null;--> statement-breakpoint
CREATE INDEX "castings_shop_outcome_idx" ON "castings" USING btree ("shop_id",(case "outcome" when 'scrap' then 0 when 'rework' then 1 when 'good' then 2 else 3 end),"poured_on" DESC NULLS LAST,"id" DESC NULLS LAST) WHERE "castings"."archived_at" is null;--> statement-breakpoint
CREATE INDEX "melts_shop_alloy_poured_idx" ON "melts" USING btree ("shop_id","alloy_id","poured_on" DESC NULLS LAST,"id" DESC NULLS LAST) WHERE "melts"."archived_at" is null;