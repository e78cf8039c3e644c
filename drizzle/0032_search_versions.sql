CREATE TABLE "search_document_versions" (
	"shop_id" text PRIMARY KEY NOT NULL,
	"version" bigint DEFAULT 0 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "search_vocabularies" (
	"shop_id" text PRIMARY KEY NOT NULL,
	"version" bigint DEFAULT 0 NOT NULL
);
