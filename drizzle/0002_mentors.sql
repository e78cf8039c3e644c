CREATE TABLE "confirmations" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"casting_id" integer NOT NULL,
	"cause_id" text,
	"cause_text" text,
	"note" text,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "fixes_tried" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"casting_id" integer NOT NULL,
	"fix" text NOT NULL,
	"next_casting_id" integer,
	"worked" text,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_by" text NOT NULL
);
--> statement-breakpoint
CREATE TABLE "review_requests" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"casting_id" integer NOT NULL,
	"note" text,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"answered_at" timestamp with time zone,
	"answered_by" text
);
--> statement-breakpoint
CREATE TABLE "rule_switches" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"rule_id" text NOT NULL,
	"off" boolean NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "shop_causes" (
	"shop_id" text NOT NULL,
	"cause_id" text NOT NULL,
	"title" text NOT NULL,
	"fixes" jsonb NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "shop_causes_pk" PRIMARY KEY("shop_id","cause_id")
);
--> statement-breakpoint
CREATE TABLE "shop_rule_versions" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"shop_rule_id" integer NOT NULL,
	"version" integer NOT NULL,
	"status" text NOT NULL,
	"rule" jsonb NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "shop_rule_versions_uq" UNIQUE("shop_rule_id","version")
);
--> statement-breakpoint
CREATE TABLE "shop_rules" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "confirmations" ADD CONSTRAINT "confirmations_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "confirmations" ADD CONSTRAINT "confirmations_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "confirmations" ADD CONSTRAINT "confirmations_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fixes_tried" ADD CONSTRAINT "fixes_tried_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fixes_tried" ADD CONSTRAINT "fixes_tried_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fixes_tried" ADD CONSTRAINT "fixes_tried_next_casting_id_castings_id_fk" FOREIGN KEY ("next_casting_id") REFERENCES "public"."castings"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fixes_tried" ADD CONSTRAINT "fixes_tried_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fixes_tried" ADD CONSTRAINT "fixes_tried_updated_by_user_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_requests" ADD CONSTRAINT "review_requests_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_requests" ADD CONSTRAINT "review_requests_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_requests" ADD CONSTRAINT "review_requests_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "review_requests" ADD CONSTRAINT "review_requests_answered_by_user_id_fk" FOREIGN KEY ("answered_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rule_switches" ADD CONSTRAINT "rule_switches_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "rule_switches" ADD CONSTRAINT "rule_switches_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_causes" ADD CONSTRAINT "shop_causes_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_causes" ADD CONSTRAINT "shop_causes_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_rule_versions" ADD CONSTRAINT "shop_rule_versions_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_rule_versions" ADD CONSTRAINT "shop_rule_versions_shop_rule_id_shop_rules_id_fk" FOREIGN KEY ("shop_rule_id") REFERENCES "public"."shop_rules"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_rule_versions" ADD CONSTRAINT "shop_rule_versions_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_rules" ADD CONSTRAINT "shop_rules_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "shop_rules" ADD CONSTRAINT "shop_rules_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "confirmations_shop_casting_idx" ON "confirmations" USING btree ("shop_id","casting_id","id");--> statement-breakpoint
CREATE INDEX "fixes_tried_casting_idx" ON "fixes_tried" USING btree ("casting_id");--> statement-breakpoint
CREATE INDEX "fixes_tried_next_idx" ON "fixes_tried" USING btree ("next_casting_id");--> statement-breakpoint
CREATE INDEX "review_requests_queue_idx" ON "review_requests" USING btree ("shop_id","answered_at","created_at");--> statement-breakpoint
CREATE INDEX "review_requests_casting_idx" ON "review_requests" USING btree ("casting_id");--> statement-breakpoint
CREATE INDEX "rule_switches_shop_rule_idx" ON "rule_switches" USING btree ("shop_id","rule_id","id");--> statement-breakpoint
CREATE INDEX "shop_rule_versions_shop_idx" ON "shop_rule_versions" USING btree ("shop_id");