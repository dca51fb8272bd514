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
CREATE TABLE "email_wording" (
	"template" text PRIMARY KEY NOT NULL,
	"heading" text,
	"intro" text,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_by" text
);
--> statement-breakpoint
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
CREATE TABLE "finisher_jobs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"order_id" uuid NOT NULL,
	"finisher_id" uuid NOT NULL,
	"part" text NOT NULL,
	"sent_on" date NOT NULL,
	"due_on" date NOT NULL,
	"back_on" date,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "finishers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"work" text NOT NULL,
	"turnaround_days" integer DEFAULT 7 NOT NULL,
	"active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "order_events" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"order_id" uuid NOT NULL,
	"from_stage" text,
	"to_stage" text NOT NULL,
	"actor_label" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "order_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"order_id" uuid NOT NULL,
	"price_item_id" uuid,
	"source" text NOT NULL,
	"description" text NOT NULL,
	"quantity" integer NOT NULL,
	"unit_price_minor" integer NOT NULL,
	"spring" jsonb,
	"sort_order" integer DEFAULT 0 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "order_photos" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"order_id" uuid NOT NULL,
	"storage_key" text NOT NULL,
	"sha256" text NOT NULL,
	"original_name" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "order_settings" (
	"id" smallint PRIMARY KEY DEFAULT 1 NOT NULL,
	"currency" text DEFAULT 'EUR' NOT NULL,
	"tax_rate_bp" integer DEFAULT 0 NOT NULL,
	"payment_mode" text DEFAULT 'full' NOT NULL,
	"deposit_percent" integer DEFAULT 30 NOT NULL,
	"notify_stages" jsonb DEFAULT '["received","shipped"]'::jsonb NOT NULL,
	"packing_instructions" text,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "orders" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"number" bigserial NOT NULL,
	"request_id" uuid NOT NULL,
	"version_id" uuid,
	"service_type" text NOT NULL,
	"stage" text DEFAULT 'awaiting_parts' NOT NULL,
	"currency" text NOT NULL,
	"tax_rate_bp" integer NOT NULL,
	"payment_mode" text DEFAULT 'full' NOT NULL,
	"deposit_percent" integer DEFAULT 0 NOT NULL,
	"accepted_at" timestamp with time zone,
	"paid_minor" integer DEFAULT 0 NOT NULL,
	"refunded_minor" integer DEFAULT 0 NOT NULL,
	"payment_status" text DEFAULT 'unpaid' NOT NULL,
	"assigned_tuner_id" text,
	"due_on" date,
	"inbound_tracking" text,
	"check_in" jsonb,
	"carrier" text,
	"tracking_number" text,
	"shipped_at" timestamp with time zone,
	"built_by" text,
	"tested_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payment_events" (
	"event_id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "payments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"order_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"status" text NOT NULL,
	"amount_minor" integer NOT NULL,
	"currency" text NOT NULL,
	"provider_session_id" text,
	"provider_payment_intent_id" text,
	"provider_refund_id" text,
	"reason" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"paid_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "price_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"code" text NOT NULL,
	"label" text NOT NULL,
	"kind" text NOT NULL,
	"unit_price_minor" integer NOT NULL,
	"active" boolean DEFAULT true NOT NULL,
	"sort_order" integer DEFAULT 0 NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "staff_invites" ADD COLUMN "revoked_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "bike_models" ADD COLUMN "fork_oil_type" text;--> statement-breakpoint
ALTER TABLE "bike_models" ADD COLUMN "fork_oil_volume_ml" double precision;--> statement-breakpoint
ALTER TABLE "bike_models" ADD COLUMN "build_notes" text;--> statement-breakpoint
ALTER TABLE "staff_notices" ADD CONSTRAINT "staff_notices_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff_notices" ADD CONSTRAINT "staff_notices_seen_by_user_id_fk" FOREIGN KEY ("seen_by") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ride_feedback" ADD CONSTRAINT "ride_feedback_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "ride_feedback" ADD CONSTRAINT "ride_feedback_version_id_recommendation_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."recommendation_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "finisher_jobs" ADD CONSTRAINT "finisher_jobs_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "finisher_jobs" ADD CONSTRAINT "finisher_jobs_finisher_id_finishers_id_fk" FOREIGN KEY ("finisher_id") REFERENCES "public"."finishers"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_events" ADD CONSTRAINT "order_events_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_lines" ADD CONSTRAINT "order_lines_price_item_id_price_items_id_fk" FOREIGN KEY ("price_item_id") REFERENCES "public"."price_items"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "order_photos" ADD CONSTRAINT "order_photos_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_version_id_recommendation_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."recommendation_versions"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "orders" ADD CONSTRAINT "orders_assigned_tuner_id_user_id_fk" FOREIGN KEY ("assigned_tuner_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "payments" ADD CONSTRAINT "payments_order_id_orders_id_fk" FOREIGN KEY ("order_id") REFERENCES "public"."orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "staff_notices_unseen_idx" ON "staff_notices" USING btree ("seen_at","kind");--> statement-breakpoint
CREATE INDEX "staff_notices_request_idx" ON "staff_notices" USING btree ("request_id");--> statement-breakpoint
CREATE INDEX "ride_feedback_request_idx" ON "ride_feedback" USING btree ("request_id","created_at");--> statement-breakpoint
CREATE INDEX "finisher_jobs_order_idx" ON "finisher_jobs" USING btree ("order_id");--> statement-breakpoint
CREATE INDEX "finisher_jobs_due_idx" ON "finisher_jobs" USING btree ("back_on","due_on");--> statement-breakpoint
CREATE INDEX "order_events_order_idx" ON "order_events" USING btree ("order_id","created_at");--> statement-breakpoint
CREATE INDEX "order_lines_order_idx" ON "order_lines" USING btree ("order_id","sort_order");--> statement-breakpoint
CREATE INDEX "order_photos_order_idx" ON "order_photos" USING btree ("order_id");--> statement-breakpoint
CREATE UNIQUE INDEX "orders_number_idx" ON "orders" USING btree ("number");--> statement-breakpoint
CREATE INDEX "orders_request_idx" ON "orders" USING btree ("request_id","created_at");--> statement-breakpoint
CREATE INDEX "orders_stage_idx" ON "orders" USING btree ("stage","due_on");--> statement-breakpoint
CREATE UNIQUE INDEX "payments_session_idx" ON "payments" USING btree ("provider_session_id");--> statement-breakpoint
CREATE UNIQUE INDEX "payments_refund_idx" ON "payments" USING btree ("provider_refund_id");--> statement-breakpoint
CREATE INDEX "payments_order_idx" ON "payments" USING btree ("order_id");--> statement-breakpoint
CREATE UNIQUE INDEX "price_items_code_idx" ON "price_items" USING btree ("code");