CREATE TABLE "search_vocabularies" (
	"shop_id" text PRIMARY KEY NOT NULL,
	"version" bigint DEFAULT 0 NOT NULL
);
