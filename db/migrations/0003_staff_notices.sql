CREATE TABLE "staff_notices" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"to_address" text NOT NULL,
	"detail" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"seen_at" timestamp with time zone,
	"seen_by" text
);
--> statement-breakpoint
ALTER TABLE "staff_notices" ADD CONSTRAINT "staff_notices_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff_notices" ADD CONSTRAINT "staff_notices_seen_by_user_id_fk" FOREIGN KEY ("seen_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "staff_notices_unseen_idx" ON "staff_notices" USING btree ("seen_at","kind");--> statement-breakpoint
CREATE INDEX "staff_notices_request_idx" ON "staff_notices" USING btree ("request_id");