DROP INDEX "builds_visibility_idx";--> statement-breakpoint
CREATE INDEX "builds_listing_idx" ON "builds" USING btree ("visibility","endorsed_at","created_at");--> statement-breakpoint
CREATE INDEX "builds_part_ids_idx" ON "builds" USING gin ("part_ids");