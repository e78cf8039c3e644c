CREATE TABLE "fix_ticks" (
	"shop_id" text NOT NULL,
	"casting_id" integer NOT NULL,
	"fix" text NOT NULL,
	"created_by" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "fix_ticks_pk" PRIMARY KEY("casting_id","fix")
);
--> statement-breakpoint
ALTER TABLE "fix_ticks" ADD CONSTRAINT "fix_ticks_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fix_ticks" ADD CONSTRAINT "fix_ticks_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "fix_ticks" ADD CONSTRAINT "fix_ticks_created_by_user_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."user"("id") ON DELETE no action ON UPDATE no action;