CREATE TABLE "calibration_cases" (
	"casting_id" integer PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"cause_id" text,
	"fired" text[],
	"agreed" text[],
	"suggested" text[],
	"rule_set_version" text DEFAULT '' NOT NULL,
	"changes" integer DEFAULT 0 NOT NULL,
	"computed" integer DEFAULT -1 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "calibration_tallies" (
	"shop_id" text NOT NULL,
	"rule_set_version" text NOT NULL,
	"kind" text NOT NULL,
	"item" text NOT NULL,
	"cases" integer NOT NULL,
	CONSTRAINT "calibration_tallies_pk" PRIMARY KEY("shop_id","rule_set_version","kind","item")
);
--> statement-breakpoint
ALTER TABLE "calibration_cases" ADD CONSTRAINT "calibration_cases_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calibration_cases" ADD CONSTRAINT "calibration_cases_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calibration_tallies" ADD CONSTRAINT "calibration_tallies_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "calibration_cases_shop_idx" ON "calibration_cases" USING btree ("shop_id","rule_set_version");--> statement-breakpoint
CREATE INDEX "search_documents_shop_cause_idx" ON "search_documents" USING btree ("shop_id","cause_id","poured_on" DESC NULLS LAST,"casting_id" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "search_documents_shop_alloy_idx" ON "search_documents" USING btree ("shop_id","alloy_key","poured_on" DESC NULLS LAST,"casting_id" DESC NULLS LAST);