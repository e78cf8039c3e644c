ALTER TYPE "public"."alloy_family" ADD VALUE 'red-brass';--> statement-breakpoint
ALTER TYPE "public"."alloy_family" ADD VALUE 'yellow-brass';--> statement-breakpoint
ALTER TYPE "public"."alloy_family" ADD VALUE 'manganese-bronze';--> statement-breakpoint
ALTER TYPE "public"."alloy_family" ADD VALUE 'tin-bronze';--> statement-breakpoint
ALTER TYPE "public"."alloy_family" ADD VALUE 'silicon-bronze';--> statement-breakpoint
ALTER TYPE "public"."alloy_family" ADD VALUE 'aluminium-bronze';--> statement-breakpoint
ALTER TYPE "public"."alloy_family" ADD VALUE 'gray-iron';--> statement-breakpoint
ALTER TYPE "public"."alloy_family" ADD VALUE 'ductile-iron';--> statement-breakpoint
ALTER TYPE "public"."defect_location" ADD VALUE 'edge' BEFORE 'thin-section';--> statement-breakpoint
ALTER TYPE "public"."defect_location" ADD VALUE 'junction' BEFORE 'throughout';--> statement-breakpoint
ALTER TYPE "public"."defect_location" ADD VALUE 'parting-line' BEFORE 'throughout';--> statement-breakpoint
ALTER TYPE "public"."defect_location" ADD VALUE 'around-core' BEFORE 'throughout';--> statement-breakpoint
ALTER TYPE "public"."defect_location" ADD VALUE 'glue-line' BEFORE 'throughout';--> statement-breakpoint
ALTER TYPE "public"."defect_location" ADD VALUE 'surface' BEFORE 'throughout';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'pinholes';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'sink';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'scab';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'rat-tail';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'buckle';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'erosion';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'mismatch';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'core-shift';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'run-out';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'leaker';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'segregation';--> statement-breakpoint
ALTER TYPE "public"."defect_type" ADD VALUE 'zinc-loss';--> statement-breakpoint
ALTER TABLE "melts" DROP CONSTRAINT "melts_pour_temp_ck";--> statement-breakpoint
ALTER TABLE "melts" ADD CONSTRAINT "melts_pour_temp_ck" CHECK ("melts"."pour_temp_c" is null or "melts"."pour_temp_c" <= 1700);