ALTER TABLE "castings" ADD COLUMN "casting_weight_kg" double precision;--> statement-breakpoint
ALTER TABLE "castings" ADD COLUMN "poured_weight_kg" double precision;--> statement-breakpoint
ALTER TABLE "melts" ADD COLUMN "charge_weight_kg" double precision;--> statement-breakpoint
ALTER TABLE "castings" ADD CONSTRAINT "castings_weights_ck" CHECK ("castings"."casting_weight_kg" is null or "castings"."poured_weight_kg" is null or "castings"."casting_weight_kg" <= "castings"."poured_weight_kg");