CREATE TYPE "public"."coating_permeability" AS ENUM('low', 'medium', 'high');--> statement-breakpoint
CREATE TYPE "public"."crucible" AS ENUM('clay-graphite', 'silicon-carbide', 'steel');--> statement-breakpoint
CREATE TYPE "public"."foam_type" AS ENUM('eps', 'copolymer', 'pmma');--> statement-breakpoint
CREATE TYPE "public"."gating_position" AS ENUM('bottom', 'side', 'top', 'parting-line');--> statement-breakpoint
CREATE TYPE "public"."modifier" AS ENUM('none', 'strontium', 'sodium');--> statement-breakpoint
CREATE TYPE "public"."sand_feel" AS ENUM('right', 'too-dry', 'too-wet');--> statement-breakpoint
CREATE TYPE "public"."sand_type" AS ENUM('synthetic-bentonite', 'natural-bonded', 'oil-bonded', 'chemically-bonded');--> statement-breakpoint
ALTER TABLE "castings" ADD COLUMN "choke_area_mm2" double precision;--> statement-breakpoint
ALTER TABLE "castings" ADD COLUMN "ingate_area_mm2" double precision;--> statement-breakpoint
ALTER TABLE "castings" ADD COLUMN "gating_ratio" text;--> statement-breakpoint
ALTER TABLE "castings" ADD COLUMN "gating" "gating_position";--> statement-breakpoint
ALTER TABLE "castings" ADD COLUMN "has_filter" boolean;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "crucible" "crucible";--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "degas_to_pour_min" double precision;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "density_index_pct" double precision;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "grain_refined" boolean;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "modifier" "modifier";--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "deoxidised" boolean;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "melt_carbon_pct" double precision;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "melt_silicon_pct" double precision;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "inoculated" boolean;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "treatment_to_pour_min" double precision;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "sand_type" "sand_type";--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "sand_compactability_pct" double precision;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "green_strength_kpa" double precision;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "sand_feel" "sand_feel";--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "mould_temp_c" double precision;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "mould_dried" boolean;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "coating_permeability" "coating_permeability";--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "foam_type" "foam_type";--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "glue_joints" boolean;