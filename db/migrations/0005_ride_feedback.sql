CREATE TABLE "ride_feedback" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"version_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"front" jsonb NOT NULL,
	"rear" jsonb NOT NULL,
	"notes" text,
	"proposal" jsonb NOT NULL,
	"revised_version" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "ride_feedback" ADD CONSTRAINT "ride_feedback_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ride_feedback" ADD CONSTRAINT "ride_feedback_version_id_recommendation_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."recommendation_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "ride_feedback_request_idx" ON "ride_feedback" USING btree ("request_id","created_at");