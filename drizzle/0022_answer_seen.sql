CREATE TABLE "answer_seen" (
	"shop_id" text NOT NULL,
	"casting_id" integer NOT NULL,
	"user_id" text NOT NULL,
	"seen_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "answer_seen_pk" PRIMARY KEY("casting_id","user_id")
);
--> statement-breakpoint
ALTER TABLE "answer_seen" ADD CONSTRAINT "answer_seen_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "answer_seen" ADD CONSTRAINT "answer_seen_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "answer_seen" ADD CONSTRAINT "answer_seen_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;