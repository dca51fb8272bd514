ALTER TABLE "bike_models" ADD COLUMN "fork_oil_type" text;--> statement-breakpoint
ALTER TABLE "bike_models" ADD COLUMN "fork_oil_volume_ml" double precision;