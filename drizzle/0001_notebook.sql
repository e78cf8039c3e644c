CREATE TABLE "alloys" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text,
	"designation" text NOT NULL,
	"designation_key" text NOT NULL,
	"family" text NOT NULL,
	"solidus_c" double precision NOT NULL,
	"liquidus_c" double precision NOT NULL,
	"density_kg_m3" double precision NOT NULL,
	"shrink_allowance_pct" double precision NOT NULL,
	"silicon_pct" double precision,
	"sources" text NOT NULL,
	"created_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "alloys_shop_designation_uq" UNIQUE NULLS NOT DISTINCT("shop_id","designation_key"),
	CONSTRAINT "alloys_solidus_liquidus_ck" CHECK ("alloys"."solidus_c" <= "alloys"."liquidus_c")
);
--> statement-breakpoint
CREATE TABLE "castings" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"melt_id" integer NOT NULL,
	"part_name" text NOT NULL,
	"pattern" text,
	"min_section_mm" double precision,
	"max_section_mm" double precision,
	"sprue_height_mm" double precision,
	"pour_time_s" double precision,
	"has_riser" boolean,
	"has_overflow" boolean,
	"has_vents" boolean,
	"orientation" text,
	"outcome" text,
	"notes" text,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "castings_sections_ck" CHECK ("castings"."min_section_mm" is null or "castings"."min_section_mm" > 0)
);
--> statement-breakpoint
CREATE TABLE "comments" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"casting_id" integer NOT NULL,
	"body" text NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "defect_marks" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"casting_id" integer NOT NULL,
	"photo_id" integer,
	"x" double precision,
	"y" double precision,
	"type" text NOT NULL,
	"location" text NOT NULL,
	"severity" integer NOT NULL,
	"note" text,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "marks_severity_ck" CHECK ("defect_marks"."severity" between 1 and 3),
	CONSTRAINT "marks_xy_ck" CHECK (("defect_marks"."x" is null or "defect_marks"."x" between 0 and 1) and ("defect_marks"."y" is null or "defect_marks"."y" between 0 and 1))
);
--> statement-breakpoint
CREATE TABLE "diagnosis_snapshots" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"casting_id" integer NOT NULL,
	"rule_set_version" text NOT NULL,
	"input" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "melts" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"alloy_id" integer NOT NULL,
	"poured_on" date NOT NULL,
	"process" text NOT NULL,
	"charge" text,
	"furnace" text,
	"melt_temp_c" double precision,
	"pour_temp_c" double precision,
	"degassing" text,
	"degas_minutes" double precision,
	"fluxed" boolean,
	"skimmed" boolean,
	"ambient_temp_c" double precision,
	"humidity_pct" double precision,
	"sand_moisture_pct" double precision,
	"coating_applied" boolean,
	"coating_dried" boolean,
	"coating_coats" integer,
	"foam_density_kg_m3" double precision,
	"notes" text,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "melts_pour_temp_ck" CHECK ("melts"."pour_temp_c" is null or "melts"."pour_temp_c" <= 1400),
	CONSTRAINT "melts_humidity_ck" CHECK ("melts"."humidity_pct" is null or "melts"."humidity_pct" between 0 and 100)
);
--> statement-breakpoint
CREATE TABLE "person_units" (
	"user_id" text PRIMARY KEY NOT NULL,
	"temperature" text NOT NULL,
	"length" text NOT NULL,
	"mass" text NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "photos" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"casting_id" integer NOT NULL,
	"file_name" text NOT NULL,
	"thumb_name" text NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"bytes" integer NOT NULL,
	"uploaded_type" text NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "photos_file_name_unique" UNIQUE("file_name"),
	CONSTRAINT "photos_thumb_name_unique" UNIQUE("thumb_name")
);
--> statement-breakpoint
ALTER TABLE "alloys" ADD CONSTRAINT "alloys_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "alloys" ADD CONSTRAINT "alloys_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "castings" ADD CONSTRAINT "castings_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "castings" ADD CONSTRAINT "castings_melt_id_melts_id_fk" FOREIGN KEY ("melt_id") REFERENCES "public"."melts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "castings" ADD CONSTRAINT "castings_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "comments" ADD CONSTRAINT "comments_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "defect_marks" ADD CONSTRAINT "defect_marks_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "defect_marks" ADD CONSTRAINT "defect_marks_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "defect_marks" ADD CONSTRAINT "defect_marks_photo_id_photos_id_fk" FOREIGN KEY ("photo_id") REFERENCES "public"."photos"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "defect_marks" ADD CONSTRAINT "defect_marks_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "diagnosis_snapshots" ADD CONSTRAINT "diagnosis_snapshots_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "diagnosis_snapshots" ADD CONSTRAINT "diagnosis_snapshots_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "diagnosis_snapshots" ADD CONSTRAINT "diagnosis_snapshots_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "melts" ADD CONSTRAINT "melts_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "melts" ADD CONSTRAINT "melts_alloy_id_alloys_id_fk" FOREIGN KEY ("alloy_id") REFERENCES "public"."alloys"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "melts" ADD CONSTRAINT "melts_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "person_units" ADD CONSTRAINT "person_units_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "photos" ADD CONSTRAINT "photos_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "castings_shop_created_idx" ON "castings" USING btree ("shop_id","created_at");--> statement-breakpoint
CREATE INDEX "castings_melt_idx" ON "castings" USING btree ("melt_id");--> statement-breakpoint
CREATE INDEX "castings_shop_part_idx" ON "castings" USING btree ("shop_id","part_name");--> statement-breakpoint
CREATE INDEX "comments_casting_idx" ON "comments" USING btree ("casting_id","created_at");--> statement-breakpoint
CREATE INDEX "marks_casting_idx" ON "defect_marks" USING btree ("casting_id");--> statement-breakpoint
CREATE INDEX "marks_shop_type_idx" ON "defect_marks" USING btree ("shop_id","type");--> statement-breakpoint
CREATE INDEX "diagnosis_casting_idx" ON "diagnosis_snapshots" USING btree ("casting_id","created_at");--> statement-breakpoint
CREATE INDEX "melts_shop_poured_idx" ON "melts" USING btree ("shop_id","poured_on","id");--> statement-breakpoint
CREATE INDEX "melts_shop_created_idx" ON "melts" USING btree ("shop_id","created_at");--> statement-breakpoint
CREATE INDEX "photos_casting_idx" ON "photos" USING btree ("casting_id");--> statement-breakpoint
CREATE INDEX "photos_shop_created_idx" ON "photos" USING btree ("shop_id","created_at");