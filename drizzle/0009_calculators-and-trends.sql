CREATE TABLE "calculations" (
	"id" serial PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"melt_id" integer NOT NULL,
	"casting_id" integer,
	"kind" text NOT NULL,
	"input" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "calculations" ADD CONSTRAINT "calculations_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calculations" ADD CONSTRAINT "calculations_melt_id_melts_id_fk" FOREIGN KEY ("melt_id") REFERENCES "public"."melts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calculations" ADD CONSTRAINT "calculations_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calculations" ADD CONSTRAINT "calculations_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "calculations_melt_idx" ON "calculations" USING btree ("shop_id","melt_id");--> statement-breakpoint
CREATE INDEX "calculations_casting_idx" ON "calculations" USING btree ("casting_id");