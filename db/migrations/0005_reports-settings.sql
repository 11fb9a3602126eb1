ALTER TABLE "shops" ADD COLUMN "time_zone" text DEFAULT 'UTC' NOT NULL;--> statement-breakpoint
ALTER TABLE "shops" ADD COLUMN "yield_target_percent" integer DEFAULT 75 NOT NULL;--> statement-breakpoint
ALTER TABLE "shops" ADD COLUMN "offcut_age_months" integer DEFAULT 6 NOT NULL;--> statement-breakpoint
CREATE INDEX "plans_finished_idx" ON "plans" USING btree ("shop_id","status","finished_at");