CREATE TYPE "public"."recut_status" AS ENUM('open', 'planned', 'cut', 'spoiled', 'cancelled');--> statement-breakpoint
CREATE TABLE "recuts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"part_id" uuid,
	"label" text NOT NULL,
	"instance" integer NOT NULL,
	"quantity" integer DEFAULT 1 NOT NULL,
	"length_mm" double precision NOT NULL,
	"width_mm" double precision NOT NULL,
	"thickness_mm" double precision NOT NULL,
	"material" text NOT NULL,
	"grain" "grain_rule" DEFAULT 'along-length' NOT NULL,
	"joint_allowance_mm" double precision DEFAULT 0 NOT NULL,
	"reason" text DEFAULT '' NOT NULL,
	"status" "recut_status" DEFAULT 'open' NOT NULL,
	"source_plan_id" uuid,
	"recut_plan_id" uuid,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"closed_at" timestamp with time zone,
	"closed_by" uuid,
	"cancel_reason" text DEFAULT '' NOT NULL,
	CONSTRAINT "recuts_quantity_positive" CHECK ("recuts"."quantity" > 0),
	CONSTRAINT "recuts_sizes_positive" CHECK ("recuts"."length_mm" > 0 and "recuts"."width_mm" > 0 and "recuts"."thickness_mm" > 0)
);
--> statement-breakpoint
ALTER TABLE "jobs" ADD COLUMN "won_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD COLUMN "reserved_change" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "plans" ADD COLUMN "spoiled_ratio" double precision;--> statement-breakpoint
ALTER TABLE "plans" ADD COLUMN "recut_plan" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "recuts" ADD CONSTRAINT "recuts_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recuts" ADD CONSTRAINT "recuts_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recuts" ADD CONSTRAINT "recuts_part_id_parts_id_fk" FOREIGN KEY ("part_id") REFERENCES "public"."parts"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recuts" ADD CONSTRAINT "recuts_source_plan_id_plans_id_fk" FOREIGN KEY ("source_plan_id") REFERENCES "public"."plans"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recuts" ADD CONSTRAINT "recuts_recut_plan_id_plans_id_fk" FOREIGN KEY ("recut_plan_id") REFERENCES "public"."plans"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recuts" ADD CONSTRAINT "recuts_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "recuts" ADD CONSTRAINT "recuts_closed_by_users_id_fk" FOREIGN KEY ("closed_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "recuts_job_idx" ON "recuts" USING btree ("shop_id","job_id","status");--> statement-breakpoint
-- Data: a reservation or its release moved the reserved count in "quantity"; that column now holds only the on-hand
-- change, and "reserved_change" the reserved one.
UPDATE "stock_movements" SET "reserved_change" = "quantity", "quantity" = 0 WHERE "kind" IN ('reserved', 'released');--> statement-breakpoint
-- A finished plan wrote a release and a consumption for the same pieces (same plan, stock, count, reason and
-- transaction time): the consumption now carries the end of the reservation, and the release goes.
UPDATE "stock_movements" AS "c" SET "reserved_change" = "r"."reserved_change"
  FROM "stock_movements" AS "r"
  WHERE "c"."kind" = 'consumed' AND "r"."kind" = 'released' AND "c"."reserved_change" = 0
    AND "c"."shop_id" = "r"."shop_id" AND "c"."plan_id" = "r"."plan_id"
    AND "c"."stock_item_id" IS NOT DISTINCT FROM "r"."stock_item_id" AND "c"."offcut_id" IS NOT DISTINCT FROM "r"."offcut_id"
    AND "c"."quantity" = "r"."reserved_change" AND "c"."reason" = "r"."reason" AND "c"."created_at" = "r"."created_at";--> statement-breakpoint
DELETE FROM "stock_movements" AS "r"
  USING "stock_movements" AS "c"
  WHERE "r"."kind" = 'released' AND "c"."kind" = 'consumed' AND "c"."reserved_change" <> 0
    AND "c"."shop_id" = "r"."shop_id" AND "c"."plan_id" = "r"."plan_id"
    AND "c"."stock_item_id" IS NOT DISTINCT FROM "r"."stock_item_id" AND "c"."offcut_id" IS NOT DISTINCT FROM "r"."offcut_id"
    AND "c"."reserved_change" = "r"."reserved_change" AND "c"."reason" = "r"."reason" AND "c"."created_at" = "r"."created_at";--> statement-breakpoint
-- Data: jobs already won (or past it) keep that they were won; statuses catch up with their plans.
UPDATE "jobs" SET "won_at" = "updated_at" WHERE "status" IN ('won', 'cutting', 'done');--> statement-breakpoint
UPDATE "jobs" AS "j" SET "status" = 'cutting'
  WHERE "j"."status" IN ('quoting', 'won', 'done')
    AND EXISTS (SELECT 1 FROM "plans" AS "p" WHERE "p"."job_id" = "j"."id" AND "p"."status" IN ('released', 'cutting'));--> statement-breakpoint
UPDATE "jobs" AS "j" SET "status" = 'done'
  WHERE "j"."status" IN ('quoting', 'won', 'cutting')
    AND NOT EXISTS (SELECT 1 FROM "plans" AS "p" WHERE "p"."job_id" = "j"."id" AND "p"."status" IN ('released', 'cutting'))
    AND EXISTS (SELECT 1 FROM "plans" AS "p" WHERE "p"."job_id" = "j"."id" AND "p"."status" = 'done');--> statement-breakpoint
UPDATE "jobs" AS "j" SET "status" = CASE WHEN "j"."won_at" IS NULL THEN 'quoting'::"job_status" ELSE 'won'::"job_status" END
  WHERE "j"."status" = 'cutting'
    AND NOT EXISTS (SELECT 1 FROM "plans" AS "p" WHERE "p"."job_id" = "j"."id" AND "p"."status" IN ('released', 'cutting', 'done'));
