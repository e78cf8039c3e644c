CREATE TABLE "calibration_rule_keys" (
	"shop_id" text NOT NULL,
	"firing_version" text NOT NULL,
	"keys" text[] NOT NULL,
	CONSTRAINT "calibration_rule_keys_pk" PRIMARY KEY("shop_id","firing_version")
);
--> statement-breakpoint
ALTER TABLE "calibration_cases" ADD COLUMN "fired_keys" text[];--> statement-breakpoint
ALTER TABLE "calibration_cases" ADD COLUMN "fired_with" text;--> statement-breakpoint
ALTER TABLE "calibration_rule_keys" ADD CONSTRAINT "calibration_rule_keys_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "calibration_cases_fired_with_idx" ON "calibration_cases" USING btree ("shop_id","fired_with");