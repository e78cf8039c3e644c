CREATE TABLE "member_changes" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"actor_id" text,
	"actor_name" text NOT NULL,
	"action" text NOT NULL,
	"subject_email" text NOT NULL,
	"detail" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "notice_settings" (
	"user_id" text PRIMARY KEY NOT NULL,
	"review_requested" boolean DEFAULT true NOT NULL,
	"cause_confirmed" boolean DEFAULT true NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "default_temperature" "temperature_unit";--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "default_length" "length_unit";--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "default_mass" "mass_unit";--> statement-breakpoint
ALTER TABLE "member_changes" ADD CONSTRAINT "member_changes_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "member_changes" ADD CONSTRAINT "member_changes_actor_id_user_id_fk" FOREIGN KEY ("actor_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "notice_settings" ADD CONSTRAINT "notice_settings_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "member_changes_shop_idx" ON "member_changes" USING btree ("shop_id","created_at");