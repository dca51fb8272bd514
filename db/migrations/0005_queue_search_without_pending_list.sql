DROP INDEX "setup_requests_search_idx";--> statement-breakpoint
CREATE INDEX "setup_requests_discipline_class_idx" ON "setup_requests" USING btree ("discipline","bike_class","created_at");--> statement-breakpoint
CREATE INDEX "setup_requests_search_idx" ON "setup_requests" USING gin ("search_text" gin_trgm_ops) WITH (fastupdate=false);