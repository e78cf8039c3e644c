CREATE TYPE "public"."alloy_family" AS ENUM('al-si', 'al-si-cu', 'al-cu', 'al-mg', 'al-zn', 'al-wrought', 'copper-base');--> statement-breakpoint
CREATE TYPE "public"."charge" AS ENUM('ingot', 'clean-scrap', 'mixed-scrap');--> statement-breakpoint
CREATE TYPE "public"."defect_location" AS ENUM('top', 'bottom', 'side', 'corner', 'thin-section', 'thick-section', 'near-gate', 'far-from-gate', 'throughout');--> statement-breakpoint
CREATE TYPE "public"."defect_type" AS ENUM('misrun', 'cold-shut', 'gas-porosity', 'blowhole', 'shrinkage', 'rounded-edges', 'dross-inclusion', 'sand-inclusion', 'hot-tear', 'crack', 'fold', 'carbon-residue', 'metal-penetration', 'rough-surface', 'sand-collapse', 'swell', 'warp', 'flash', 'blister');--> statement-breakpoint
CREATE TYPE "public"."degassing_method" AS ENUM('none', 'argon-lance', 'nitrogen-lance', 'rotary', 'tablet');--> statement-breakpoint
CREATE TYPE "public"."length_unit" AS ENUM('mm', 'in');--> statement-breakpoint
CREATE TYPE "public"."mass_unit" AS ENUM('kg', 'lb');--> statement-breakpoint
CREATE TYPE "public"."outcome" AS ENUM('good', 'rework', 'scrap');--> statement-breakpoint
CREATE TYPE "public"."process" AS ENUM('green-sand', 'no-bake-sand', 'lost-foam', 'investment', 'plaster', 'permanent-mould');--> statement-breakpoint
CREATE TYPE "public"."rule_status" AS ENUM('draft', 'published', 'retired');--> statement-breakpoint
CREATE TYPE "public"."temperature_unit" AS ENUM('C', 'F');--> statement-breakpoint
CREATE TYPE "public"."worked" AS ENUM('yes', 'partly', 'no');--> statement-breakpoint
ALTER TABLE "shop_settings" ALTER COLUMN "default_process" SET DATA TYPE "public"."process" USING "default_process"::"public"."process";--> statement-breakpoint
ALTER TABLE "alloys" ALTER COLUMN "family" SET DATA TYPE "public"."alloy_family" USING "family"::"public"."alloy_family";--> statement-breakpoint
ALTER TABLE "castings" ALTER COLUMN "outcome" SET DATA TYPE "public"."outcome" USING "outcome"::"public"."outcome";--> statement-breakpoint
ALTER TABLE "defect_marks" ALTER COLUMN "type" SET DATA TYPE "public"."defect_type" USING "type"::"public"."defect_type";--> statement-breakpoint
ALTER TABLE "defect_marks" ALTER COLUMN "location" SET DATA TYPE "public"."defect_location" USING "location"::"public"."defect_location";--> statement-breakpoint
ALTER TABLE "melts" ALTER COLUMN "process" SET DATA TYPE "public"."process" USING "process"::"public"."process";--> statement-breakpoint
ALTER TABLE "melts" ALTER COLUMN "charge" SET DATA TYPE charge USING "charge"::charge;--> statement-breakpoint
ALTER TABLE "melts" ALTER COLUMN "degassing" SET DATA TYPE "public"."degassing_method" USING "degassing"::"public"."degassing_method";--> statement-breakpoint
ALTER TABLE "person_units" ALTER COLUMN "temperature" SET DATA TYPE "public"."temperature_unit" USING "temperature"::"public"."temperature_unit";--> statement-breakpoint
ALTER TABLE "person_units" ALTER COLUMN "length" SET DATA TYPE "public"."length_unit" USING "length"::"public"."length_unit";--> statement-breakpoint
ALTER TABLE "person_units" ALTER COLUMN "mass" SET DATA TYPE "public"."mass_unit" USING "mass"::"public"."mass_unit";--> statement-breakpoint
ALTER TABLE "fixes_tried" ALTER COLUMN "worked" SET DATA TYPE "public"."worked" USING "worked"::"public"."worked";--> statement-breakpoint
ALTER TABLE "shop_rule_versions" ALTER COLUMN "status" SET DATA TYPE "public"."rule_status" USING "status"::"public"."rule_status";