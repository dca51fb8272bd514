DROP INDEX "outbound_emails_status_idx";--> statement-breakpoint
ALTER TABLE "outbound_emails" ADD COLUMN "html" text;--> statement-breakpoint
ALTER TABLE "outbound_emails" ADD COLUMN "text_body" text;--> statement-breakpoint
ALTER TABLE "outbound_emails" ADD COLUMN "reply_to" text;--> statement-breakpoint
ALTER TABLE "outbound_emails" ADD COLUMN "attachments" jsonb;--> statement-breakpoint
ALTER TABLE "outbound_emails" ADD COLUMN "idempotency_key" text DEFAULT ('sagwise-outbound-' || gen_random_uuid()::text) NOT NULL;--> statement-breakpoint
ALTER TABLE "outbound_emails" ADD COLUMN "next_attempt_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
ALTER TABLE "outbound_emails" ADD COLUMN "claimed_until" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "outbound_emails" ADD COLUMN "claimed_by" text;--> statement-breakpoint
ALTER TABLE "outbound_emails" ADD COLUMN "audit" jsonb;--> statement-breakpoint
CREATE INDEX "outbound_emails_due_idx" ON "outbound_emails" USING btree ("status","next_attempt_at");--> statement-breakpoint
CREATE UNIQUE INDEX "outbound_emails_idempotency_key_idx" ON "outbound_emails" USING btree ("idempotency_key");