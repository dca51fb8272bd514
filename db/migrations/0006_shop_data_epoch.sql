CREATE TABLE "shop_data_epoch" (
	"id" smallint PRIMARY KEY DEFAULT 1 NOT NULL,
	"epoch" uuid DEFAULT gen_random_uuid() NOT NULL
);
--> statement-breakpoint
INSERT INTO "shop_data_epoch" ("id") VALUES (1);
--> statement-breakpoint
-- A new random token on every write (once per statement, after it) to the tables a process may keep
-- a copy of; the update takes part in the writer's transaction, so readers see the new token exactly
-- when they can see the new rows.
CREATE FUNCTION "bump_shop_data_epoch"() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  UPDATE "shop_data_epoch" SET "epoch" = gen_random_uuid();
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE TRIGGER "shop_settings_epoch" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "shop_settings" FOR EACH STATEMENT EXECUTE FUNCTION "bump_shop_data_epoch"();
--> statement-breakpoint
CREATE TRIGGER "bike_models_epoch" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "bike_models" FOR EACH STATEMENT EXECUTE FUNCTION "bump_shop_data_epoch"();
--> statement-breakpoint
CREATE TRIGGER "bike_calibrations_epoch" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "bike_calibrations" FOR EACH STATEMENT EXECUTE FUNCTION "bump_shop_data_epoch"();
--> statement-breakpoint
CREATE TRIGGER "spring_stock_epoch" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "spring_stock" FOR EACH STATEMENT EXECUTE FUNCTION "bump_shop_data_epoch"();
--> statement-breakpoint
CREATE TRIGGER "setup_targets_epoch" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "setup_targets" FOR EACH STATEMENT EXECUTE FUNCTION "bump_shop_data_epoch"();
--> statement-breakpoint
CREATE TRIGGER "clicker_rules_epoch" AFTER INSERT OR UPDATE OR DELETE OR TRUNCATE ON "clicker_rules" FOR EACH STATEMENT EXECUTE FUNCTION "bump_shop_data_epoch"();
