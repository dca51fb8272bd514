CREATE TABLE "email_wording" (
	"template" text PRIMARY KEY NOT NULL,
	"heading" text,
	"intro" text,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_by" text
);
