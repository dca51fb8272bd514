DROP INDEX "setup_requests_status_created_idx";--> statement-breakpoint
DROP INDEX "setup_requests_created_idx";--> statement-breakpoint
DROP INDEX "setup_requests_tuner_idx";--> statement-breakpoint
DROP INDEX "setup_requests_discipline_idx";--> statement-breakpoint
DROP INDEX "setup_requests_bike_class_idx";--> statement-breakpoint
DROP INDEX "setup_requests_discipline_class_idx";--> statement-breakpoint
CREATE INDEX "setup_requests_status_created_idx" ON "setup_requests" USING btree ("status","created_at","id");--> statement-breakpoint
CREATE INDEX "setup_requests_created_idx" ON "setup_requests" USING btree ("created_at","id");--> statement-breakpoint
CREATE INDEX "setup_requests_tuner_idx" ON "setup_requests" USING btree ("assigned_tuner_id","created_at","id");--> statement-breakpoint
CREATE INDEX "setup_requests_discipline_idx" ON "setup_requests" USING btree ("discipline","created_at","id");--> statement-breakpoint
CREATE INDEX "setup_requests_bike_class_idx" ON "setup_requests" USING btree ("bike_class","created_at","id");--> statement-breakpoint
CREATE INDEX "setup_requests_discipline_class_idx" ON "setup_requests" USING btree ("discipline","bike_class","created_at","id");