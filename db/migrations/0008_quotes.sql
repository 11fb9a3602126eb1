CREATE TYPE "public"."quote_revision_status" AS ENUM('draft', 'sent', 'replaced');--> statement-breakpoint
ALTER TYPE "public"."job_status" ADD VALUE 'quoted' BEFORE 'won';--> statement-breakpoint
CREATE TABLE "customers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"company" text DEFAULT '' NOT NULL,
	"email" text DEFAULT '' NOT NULL,
	"phone" text DEFAULT '' NOT NULL,
	"billing_address" text DEFAULT '' NOT NULL,
	"site_address" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "hardware_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"unit" text NOT NULL,
	"price_minor" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "quote_revisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"quote_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"revision" integer NOT NULL,
	"status" "quote_revision_status" DEFAULT 'draft' NOT NULL,
	"plan_id" uuid,
	"currency" text NOT NULL,
	"lines" jsonb NOT NULL,
	"markup_material_percent" double precision NOT NULL,
	"markup_hardware_percent" double precision NOT NULL,
	"discount" jsonb NOT NULL,
	"tax_percent" double precision NOT NULL,
	"deposit_percent" double precision NOT NULL,
	"validity_days" integer NOT NULL,
	"terms" text NOT NULL,
	"sent_at" timestamp with time zone,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "quotes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "shops" ADD COLUMN "pricing" jsonb DEFAULT '{"hourlyRateMinor":{"saw":6500,"machining":7200,"assembly":5500,"finishing":4800},"minutesPerCut":0.75,"minutesPerPiece":2.5,"setupMinutesPerCard":20,"minutesPerJointCorner":1.5,"assemblyMinutesPerBox":12,"finishingMinutesPerM2":null,"markupPercent":{"material":30,"hardware":20},"taxPercent":0,"taxable":{"material":true,"hardware":true,"labour":false},"depositPercent":50,"validityDays":30,"terms":"Prices are valid for the days shown. A deposit is due on acceptance; work is scheduled once it is received. The balance is due on delivery. Changes after acceptance are quoted separately.","offcutValuation":"area-cost"}'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "jobs" ADD COLUMN "customer_id" uuid;--> statement-breakpoint
ALTER TABLE "customers" ADD CONSTRAINT "customers_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "hardware_items" ADD CONSTRAINT "hardware_items_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_revisions" ADD CONSTRAINT "quote_revisions_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_revisions" ADD CONSTRAINT "quote_revisions_quote_id_quotes_id_fk" FOREIGN KEY ("quote_id") REFERENCES "public"."quotes"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_revisions" ADD CONSTRAINT "quote_revisions_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_revisions" ADD CONSTRAINT "quote_revisions_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_revisions" ADD CONSTRAINT "quote_revisions_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quotes" ADD CONSTRAINT "quotes_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "customers_shop_idx" ON "customers" USING btree ("shop_id");--> statement-breakpoint
CREATE UNIQUE INDEX "hardware_items_shop_name_idx" ON "hardware_items" USING btree ("shop_id","name");--> statement-breakpoint
CREATE UNIQUE INDEX "quote_revisions_quote_revision_idx" ON "quote_revisions" USING btree ("quote_id","revision");--> statement-breakpoint
CREATE INDEX "quote_revisions_job_idx" ON "quote_revisions" USING btree ("job_id");--> statement-breakpoint
CREATE UNIQUE INDEX "quotes_shop_number_idx" ON "quotes" USING btree ("shop_id","number");--> statement-breakpoint
CREATE INDEX "quotes_job_idx" ON "quotes" USING btree ("job_id");--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "jobs_customer_idx" ON "jobs" USING btree ("customer_id");--> statement-breakpoint
-- ============================================================================================================
-- HAND-WRITTEN (not generated by drizzle-kit): jobs had a free-text customer name; each distinct name of a shop
-- (spaces trimmed and runs of spaces made one, letter case ignored) becomes one customer, and its jobs point at it.
-- The generated `DROP COLUMN "customer"` was moved here, after the conversion that reads the column.
-- ============================================================================================================
INSERT INTO "customers" ("shop_id", "name", "created_at", "updated_at")
SELECT "shop_id", min(regexp_replace(btrim("customer"), '\s+', ' ', 'g')), min("created_at"), now()
FROM "jobs"
WHERE btrim("customer") <> ''
GROUP BY "shop_id", lower(regexp_replace(btrim("customer"), '\s+', ' ', 'g'));--> statement-breakpoint
UPDATE "jobs" AS j SET "customer_id" = c."id"
FROM "customers" AS c
WHERE c."shop_id" = j."shop_id"
  AND btrim(j."customer") <> ''
  AND lower(c."name") = lower(regexp_replace(btrim(j."customer"), '\s+', ' ', 'g'));--> statement-breakpoint
ALTER TABLE "jobs" DROP COLUMN "customer";
