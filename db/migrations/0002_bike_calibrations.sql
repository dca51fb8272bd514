CREATE TABLE "bike_calibrations" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"bike_model_id" uuid NOT NULL,
	"rear_sprung_kg" double precision NOT NULL,
	"front_sprung_kg" double precision NOT NULL,
	"rider_rear_share" double precision NOT NULL,
	"reports" integer NOT NULL,
	"sag_report_ids" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"rms_before_mm" double precision NOT NULL,
	"rms_after_mm" double precision NOT NULL,
	"applied_by_id" text,
	"applied_by_label" text NOT NULL,
	"applied_at" timestamp with time zone DEFAULT now() NOT NULL,
	"undone_by_id" text,
	"undone_by_label" text,
	"undone_at" timestamp with time zone
);
--> statement-breakpoint
ALTER TABLE "bike_calibrations" ADD CONSTRAINT "bike_calibrations_bike_model_id_bike_models_id_fk" FOREIGN KEY ("bike_model_id") REFERENCES "public"."bike_models"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bike_calibrations" ADD CONSTRAINT "bike_calibrations_applied_by_id_user_id_fk" FOREIGN KEY ("applied_by_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "bike_calibrations" ADD CONSTRAINT "bike_calibrations_undone_by_id_user_id_fk" FOREIGN KEY ("undone_by_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "bike_calibrations_model_idx" ON "bike_calibrations" USING btree ("bike_model_id","applied_at");--> statement-breakpoint
CREATE UNIQUE INDEX "bike_calibrations_one_active_idx" ON "bike_calibrations" USING btree ("bike_model_id") WHERE "bike_calibrations"."undone_at" is null;