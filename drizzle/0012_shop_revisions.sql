CREATE TABLE "shop_revisions" (
	"shop_id" text PRIMARY KEY NOT NULL,
	"revision" bigint DEFAULT 0 NOT NULL
);
