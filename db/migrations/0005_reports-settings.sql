ALTER TABLE "shops" ADD COLUMN "time_zone" text DEFAULT 'UTC' NOT NULL;--> statement-breakpoint
ALTER TABLE "shops" ADD COLUMN "yield_target_percent" integer DEFAULT 75 NOT NULL;--> statement-breakpoint
ALTER TABLE "shops" ADD COLUMN "offcut_age_months" integer DEFAULT 6 NOT NULL;--> statement-breakpoint
ALTER TABLE "plan_pieces" ADD COLUMN "part_area_mm2" double precision;--> statement-breakpoint
ALTER TABLE "plan_pieces" ADD COLUMN "spoiled_area_mm2" double precision;--> statement-breakpoint
CREATE INDEX "plans_finished_idx" ON "plans" USING btree ("shop_id","status","finished_at");--> statement-breakpoint
-- Hand-written: the piece figures of plans finished before this migration, from their placements.
UPDATE "plan_pieces" AS pp SET
  "part_area_mm2" = coalesce((SELECT sum(pl."length_mm" * pl."width_mm") FROM "placements" pl WHERE pl."plan_piece_id" = pp."id" AND NOT pl."damaged"), 0),
  "spoiled_area_mm2" = coalesce((SELECT sum(pl."length_mm" * pl."width_mm") FROM "placements" pl WHERE pl."plan_piece_id" = pp."id" AND pl."damaged"), 0)
FROM "plans" p WHERE p."id" = pp."plan_id" AND p."status" = 'done';
