CREATE TABLE "service_hour_logs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"hours" double precision NOT NULL,
	"ridden_on" date NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "service_intervals" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"item" text NOT NULL,
	"discipline" text NOT NULL,
	"hours" double precision NOT NULL,
	"months" integer,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "service_reminders" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"item" text NOT NULL,
	"due_on" date NOT NULL,
	"outbound_email_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "service_settings" (
	"id" smallint PRIMARY KEY DEFAULT 1 NOT NULL,
	"notice_days" integer DEFAULT 14 NOT NULL,
	"time_zone" text DEFAULT 'UTC' NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "service_hour_logs" ADD CONSTRAINT "service_hour_logs_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_reminders" ADD CONSTRAINT "service_reminders_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "service_reminders" ADD CONSTRAINT "service_reminders_outbound_email_id_outbound_emails_id_fk" FOREIGN KEY ("outbound_email_id") REFERENCES "public"."outbound_emails"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "service_hour_logs_request_idx" ON "service_hour_logs" USING btree ("request_id","ridden_on");--> statement-breakpoint
CREATE UNIQUE INDEX "service_intervals_item_discipline_idx" ON "service_intervals" USING btree ("item","discipline");--> statement-breakpoint
CREATE UNIQUE INDEX "service_reminders_once_idx" ON "service_reminders" USING btree ("request_id","item","due_on");