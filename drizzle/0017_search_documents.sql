CREATE TABLE "search_documents" (
	"casting_id" integer PRIMARY KEY NOT NULL,
	"shop_id" text NOT NULL,
	"melt_id" integer NOT NULL,
	"part_name" text NOT NULL,
	"pattern" text,
	"poured_on" date NOT NULL,
	"alloy" text NOT NULL,
	"alloy_key" text NOT NULL,
	"alloy_family" "alloy_family" NOT NULL,
	"process" "process" NOT NULL,
	"degassing" "degassing_method",
	"outcome" "outcome",
	"defect_types" "defect_type"[] NOT NULL,
	"marks" jsonb NOT NULL,
	"mark_places" text[] NOT NULL,
	"cause_id" text,
	"cause_title" text,
	"cause_confirmed" boolean NOT NULL,
	"fix_worked" "worked",
	"superheat_c" double precision,
	"min_section_mm" double precision,
	"created_by" text NOT NULL,
	"causes_text" text NOT NULL,
	"notes_text" text NOT NULL,
	"comments_text" text NOT NULL,
	"document" "tsvector" NOT NULL,
	"refreshed_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "search_labels" (
	"kind" text NOT NULL,
	"code" text NOT NULL,
	"words" text NOT NULL,
	CONSTRAINT "search_labels_pk" PRIMARY KEY("kind","code")
);
--> statement-breakpoint
CREATE TABLE "search_words" (
	"shop_id" text NOT NULL,
	"word" text NOT NULL,
	CONSTRAINT "search_words_pk" PRIMARY KEY("shop_id","word")
);
--> statement-breakpoint
DROP TABLE "search_changes" CASCADE;--> statement-breakpoint
ALTER TABLE "search_documents" ADD CONSTRAINT "search_documents_casting_id_castings_id_fk" FOREIGN KEY ("casting_id") REFERENCES "public"."castings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "search_documents" ADD CONSTRAINT "search_documents_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "search_words" ADD CONSTRAINT "search_words_shop_id_organization_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."organization"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "search_documents_shop_date_idx" ON "search_documents" USING btree ("shop_id","poured_on" DESC NULLS LAST,"casting_id" DESC NULLS LAST);--> statement-breakpoint
CREATE INDEX "search_documents_document_idx" ON "search_documents" USING gin ("document");--> statement-breakpoint
CREATE INDEX "search_documents_defects_idx" ON "search_documents" USING gin ("defect_types");--> statement-breakpoint
CREATE INDEX "search_words_nearest_idx" ON "search_words" USING gist ("shop_id","word" gist_trgm_ops);