CREATE EXTENSION IF NOT EXISTS pg_trgm;--> statement-breakpoint
CREATE TABLE "account" (
	"id" text PRIMARY KEY NOT NULL,
	"account_id" text NOT NULL,
	"provider_id" text NOT NULL,
	"user_id" text NOT NULL,
	"access_token" text,
	"refresh_token" text,
	"id_token" text,
	"access_token_expires_at" timestamp with time zone,
	"refresh_token_expires_at" timestamp with time zone,
	"scope" text,
	"password" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "session" (
	"id" text PRIMARY KEY NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"token" text NOT NULL,
	"ip_address" text,
	"user_agent" text,
	"user_id" text NOT NULL,
	"impersonated_by" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "session_token_unique" UNIQUE("token")
);
--> statement-breakpoint
CREATE TABLE "staff_invites" (
	"id" text PRIMARY KEY NOT NULL,
	"email" text NOT NULL,
	"role" text NOT NULL,
	"token_hash" text NOT NULL,
	"invited_by_id" text,
	"expires_at" timestamp with time zone NOT NULL,
	"accepted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "staff_invites_token_hash_unique" UNIQUE("token_hash")
);
--> statement-breakpoint
CREATE TABLE "user" (
	"id" text PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"email" text NOT NULL,
	"email_verified" boolean DEFAULT false NOT NULL,
	"image" text,
	"role" text DEFAULT 'rider' NOT NULL,
	"banned" boolean DEFAULT false,
	"ban_reason" text,
	"ban_expires" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "user_email_unique" UNIQUE("email")
);
--> statement-breakpoint
CREATE TABLE "verification" (
	"id" text PRIMARY KEY NOT NULL,
	"identifier" text NOT NULL,
	"value" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "bike_models" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slug" text NOT NULL,
	"name" text NOT NULL,
	"bike_class" text NOT NULL,
	"year_from" integer,
	"year_to" integer,
	"is_typical" boolean DEFAULT false NOT NULL,
	"fork_kind" text NOT NULL,
	"rear_wheel_travel_mm" double precision NOT NULL,
	"spec" jsonb NOT NULL,
	"notes" text,
	"retired_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "clicker_rules" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"rule" jsonb NOT NULL,
	"sort_order" integer DEFAULT 0 NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "setup_targets" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"discipline" text NOT NULL,
	"skill" text NOT NULL,
	"values" jsonb NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "shop_settings" (
	"id" smallint PRIMARY KEY DEFAULT 1 NOT NULL,
	"name" text NOT NULL,
	"email" text NOT NULL,
	"phone" text,
	"address" text,
	"website" text,
	"units" text DEFAULT 'metric' NOT NULL,
	"paper_size" text DEFAULT 'A4' NOT NULL,
	"sheet_footer" text,
	"gear_mass_kg" double precision DEFAULT 8 NOT NULL,
	"frequency_ratio_min" double precision DEFAULT 0.8 NOT NULL,
	"frequency_ratio_max" double precision DEFAULT 1.8 NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "spring_stock" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"end" text NOT NULL,
	"rate_n_mm" double precision NOT NULL,
	"quantity" integer DEFAULT 0 NOT NULL,
	"free_length_mm" double precision,
	"inner_diameter_mm" double precision,
	"fit_notes" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "audit_events" (
	"id" bigserial PRIMARY KEY NOT NULL,
	"request_id" uuid,
	"actor_user_id" text,
	"actor_label" text NOT NULL,
	"action" text NOT NULL,
	"detail" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "outbound_emails" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid,
	"template" text NOT NULL,
	"to_address" text NOT NULL,
	"subject" text NOT NULL,
	"status" text DEFAULT 'queued' NOT NULL,
	"provider_message_id" text,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sent_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "recommendation_versions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"version" integer NOT NULL,
	"state" text DEFAULT 'draft' NOT NULL,
	"engine_version" text NOT NULL,
	"input" jsonb NOT NULL,
	"output" jsonb NOT NULL,
	"overrides" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"notes_for_rider" text,
	"internal_notes" text,
	"created_by_id" text,
	"approved_by_id" text,
	"approved_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "request_messages" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"author" text NOT NULL,
	"author_user_id" text,
	"body" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "sag_reports" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"version_id" uuid,
	"measured" jsonb NOT NULL,
	"verdict" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "setup_requests" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"number" bigserial NOT NULL,
	"status" text DEFAULT 'submitted' NOT NULL,
	"rider_name" text NOT NULL,
	"rider_email" text NOT NULL,
	"rider_phone" text,
	"rider_user_id" text,
	"discipline" text NOT NULL,
	"skill" text NOT NULL,
	"bike_model_id" uuid,
	"bike_class" text,
	"bike_label" text NOT NULL,
	"bike_year" integer,
	"rider_mass_kg" double precision NOT NULL,
	"answers" jsonb NOT NULL,
	"assigned_tuner_id" text,
	"decline_reason" text,
	"search_text" text GENERATED ALWAYS AS (lower(rider_name || ' ' || rider_email || ' ' || bike_label)) STORED,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "status_links" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"token_hash" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"last_used_at" timestamp with time zone
);
--> statement-breakpoint
CREATE TABLE "uploads" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"request_id" uuid NOT NULL,
	"storage_key" text NOT NULL,
	"sha256" text NOT NULL,
	"original_name" text NOT NULL,
	"content_type" text NOT NULL,
	"size_bytes" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "account" ADD CONSTRAINT "account_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "session" ADD CONSTRAINT "session_user_id_user_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."user"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "staff_invites" ADD CONSTRAINT "staff_invites_invited_by_id_user_id_fk" FOREIGN KEY ("invited_by_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_actor_user_id_user_id_fk" FOREIGN KEY ("actor_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "outbound_emails" ADD CONSTRAINT "outbound_emails_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recommendation_versions" ADD CONSTRAINT "recommendation_versions_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recommendation_versions" ADD CONSTRAINT "recommendation_versions_created_by_id_user_id_fk" FOREIGN KEY ("created_by_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recommendation_versions" ADD CONSTRAINT "recommendation_versions_approved_by_id_user_id_fk" FOREIGN KEY ("approved_by_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "request_messages" ADD CONSTRAINT "request_messages_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "request_messages" ADD CONSTRAINT "request_messages_author_user_id_user_id_fk" FOREIGN KEY ("author_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sag_reports" ADD CONSTRAINT "sag_reports_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "sag_reports" ADD CONSTRAINT "sag_reports_version_id_recommendation_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."recommendation_versions"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setup_requests" ADD CONSTRAINT "setup_requests_rider_user_id_user_id_fk" FOREIGN KEY ("rider_user_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setup_requests" ADD CONSTRAINT "setup_requests_bike_model_id_bike_models_id_fk" FOREIGN KEY ("bike_model_id") REFERENCES "public"."bike_models"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setup_requests" ADD CONSTRAINT "setup_requests_assigned_tuner_id_user_id_fk" FOREIGN KEY ("assigned_tuner_id") REFERENCES "public"."user"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "status_links" ADD CONSTRAINT "status_links_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "uploads" ADD CONSTRAINT "uploads_request_id_setup_requests_id_fk" FOREIGN KEY ("request_id") REFERENCES "public"."setup_requests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "account_user_idx" ON "account" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "session_user_idx" ON "session" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "staff_invites_email_idx" ON "staff_invites" USING btree ("email");--> statement-breakpoint
CREATE INDEX "user_role_idx" ON "user" USING btree ("role");--> statement-breakpoint
CREATE INDEX "verification_identifier_idx" ON "verification" USING btree ("identifier");--> statement-breakpoint
CREATE UNIQUE INDEX "bike_models_slug_idx" ON "bike_models" USING btree ("slug");--> statement-breakpoint
CREATE INDEX "bike_models_name_idx" ON "bike_models" USING btree (lower("name"));--> statement-breakpoint
CREATE INDEX "bike_models_class_idx" ON "bike_models" USING btree ("bike_class");--> statement-breakpoint
CREATE INDEX "clicker_rules_order_idx" ON "clicker_rules" USING btree ("sort_order");--> statement-breakpoint
CREATE UNIQUE INDEX "setup_targets_discipline_skill_idx" ON "setup_targets" USING btree ("discipline","skill");--> statement-breakpoint
CREATE INDEX "spring_stock_end_rate_idx" ON "spring_stock" USING btree ("end","rate_n_mm");--> statement-breakpoint
CREATE INDEX "audit_events_request_idx" ON "audit_events" USING btree ("request_id","created_at");--> statement-breakpoint
CREATE INDEX "audit_events_created_idx" ON "audit_events" USING btree ("created_at");--> statement-breakpoint
CREATE INDEX "outbound_emails_request_idx" ON "outbound_emails" USING btree ("request_id","created_at");--> statement-breakpoint
CREATE INDEX "outbound_emails_status_idx" ON "outbound_emails" USING btree ("status");--> statement-breakpoint
CREATE UNIQUE INDEX "recommendation_versions_request_version_idx" ON "recommendation_versions" USING btree ("request_id","version");--> statement-breakpoint
CREATE INDEX "request_messages_request_idx" ON "request_messages" USING btree ("request_id","created_at");--> statement-breakpoint
CREATE INDEX "sag_reports_request_idx" ON "sag_reports" USING btree ("request_id","created_at");--> statement-breakpoint
CREATE UNIQUE INDEX "setup_requests_number_idx" ON "setup_requests" USING btree ("number");--> statement-breakpoint
CREATE INDEX "setup_requests_status_created_idx" ON "setup_requests" USING btree ("status","created_at");--> statement-breakpoint
CREATE INDEX "setup_requests_created_idx" ON "setup_requests" USING btree ("created_at");--> statement-breakpoint
CREATE INDEX "setup_requests_email_idx" ON "setup_requests" USING btree ("rider_email");--> statement-breakpoint
CREATE INDEX "setup_requests_tuner_idx" ON "setup_requests" USING btree ("assigned_tuner_id","created_at");--> statement-breakpoint
CREATE INDEX "setup_requests_discipline_idx" ON "setup_requests" USING btree ("discipline","created_at");--> statement-breakpoint
CREATE INDEX "setup_requests_bike_class_idx" ON "setup_requests" USING btree ("bike_class","created_at");--> statement-breakpoint
CREATE INDEX "setup_requests_rider_name_idx" ON "setup_requests" USING btree (lower("rider_name"));--> statement-breakpoint
CREATE INDEX "setup_requests_search_idx" ON "setup_requests" USING gin ("search_text" gin_trgm_ops);--> statement-breakpoint
CREATE UNIQUE INDEX "status_links_token_idx" ON "status_links" USING btree ("token_hash");--> statement-breakpoint
CREATE INDEX "status_links_request_idx" ON "status_links" USING btree ("request_id");--> statement-breakpoint
CREATE INDEX "uploads_request_idx" ON "uploads" USING btree ("request_id");