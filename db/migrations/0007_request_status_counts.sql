CREATE TABLE "request_status_counts" (
	"status" text PRIMARY KEY NOT NULL,
	"n" bigint DEFAULT 0 NOT NULL
);
--> statement-breakpoint
-- Each row change of setup_requests moves its status's count in the writer's transaction, so a reader
-- sees the counts exactly when it can see the rows.
CREATE FUNCTION "count_request_statuses"() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  gone text;
  came text;
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') THEN gone := OLD."status"; END IF;
  IF TG_OP IN ('UPDATE', 'INSERT') THEN came := NEW."status"; END IF;
  -- Two writers moving requests between the same two statuses in opposite directions take the two
  -- rows' locks in one order (by status), so one waits for the other instead of a deadlock.
  IF gone IS NOT NULL AND (came IS NULL OR gone < came) THEN
    UPDATE "request_status_counts" SET "n" = "n" - 1 WHERE "status" = gone;
    gone := NULL;
  END IF;
  IF came IS NOT NULL THEN
    INSERT INTO "request_status_counts" ("status", "n") VALUES (came, 1)
      ON CONFLICT ("status") DO UPDATE SET "n" = "request_status_counts"."n" + 1;
  END IF;
  IF gone IS NOT NULL THEN
    UPDATE "request_status_counts" SET "n" = "n" - 1 WHERE "status" = gone;
  END IF;
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE FUNCTION "reset_request_status_counts"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  DELETE FROM "request_status_counts";
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE TRIGGER "setup_requests_count_rows" AFTER INSERT OR DELETE ON "setup_requests" FOR EACH ROW EXECUTE FUNCTION "count_request_statuses"();
--> statement-breakpoint
CREATE TRIGGER "setup_requests_count_status" AFTER UPDATE OF "status" ON "setup_requests" FOR EACH ROW WHEN (OLD."status" IS DISTINCT FROM NEW."status") EXECUTE FUNCTION "count_request_statuses"();
--> statement-breakpoint
CREATE TRIGGER "setup_requests_count_truncate" AFTER TRUNCATE ON "setup_requests" FOR EACH STATEMENT EXECUTE FUNCTION "reset_request_status_counts"();
--> statement-breakpoint
-- The requests already there (the triggers above hold writers off setup_requests until this
-- migration commits, so none is missed or counted twice).
INSERT INTO "request_status_counts" ("status", "n") SELECT "status", count(*) FROM "setup_requests" GROUP BY "status";
