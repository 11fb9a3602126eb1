CREATE TYPE "public"."grain_rule" AS ENUM('along-length', 'any');--> statement-breakpoint
CREATE TYPE "public"."job_status" AS ENUM('quoting', 'won', 'cutting', 'done', 'archived');--> statement-breakpoint
CREATE TYPE "public"."movement_kind" AS ENUM('received', 'reserved', 'released', 'consumed', 'offcut-created', 'scrapped', 'adjusted');--> statement-breakpoint
CREATE TYPE "public"."offcut_status" AS ENUM('available', 'reserved', 'used', 'scrapped');--> statement-breakpoint
CREATE TYPE "public"."plan_status" AS ENUM('draft', 'released', 'cutting', 'done', 'cancelled');--> statement-breakpoint
CREATE TYPE "public"."role" AS ENUM('owner', 'estimator', 'cutter');--> statement-breakpoint
CREATE TYPE "public"."stock_grain" AS ENUM('along-length', 'none');--> statement-breakpoint
CREATE TYPE "public"."stock_kind" AS ENUM('sheet', 'board');--> statement-breakpoint
CREATE TABLE "shops" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"name" text NOT NULL,
	"units" jsonb DEFAULT '{"system":"imperial","precision":16,"feet":false}'::jsonb NOT NULL,
	"currency" text DEFAULT 'USD' NOT NULL,
	"kerf_mm" double precision DEFAULT 3.2 NOT NULL,
	"edge_trim_mm" double precision DEFAULT 10 NOT NULL,
	"min_offcut_length_mm" double precision DEFAULT 300 NOT NULL,
	"min_offcut_width_mm" double precision DEFAULT 100 NOT NULL,
	"waste_percent" integer DEFAULT 15 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "users" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"password_hash" text NOT NULL,
	"role" "role" NOT NULL,
	"token_version" integer DEFAULT 1 NOT NULL,
	"active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "jobs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"customer" text DEFAULT '' NOT NULL,
	"status" "job_status" DEFAULT 'quoting' NOT NULL,
	"due_date" date,
	"notes" text DEFAULT '' NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "drawer_schedules" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"label" text NOT NULL,
	"input" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "parts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"label" text NOT NULL,
	"quantity" integer NOT NULL,
	"length_mm" double precision NOT NULL,
	"width_mm" double precision NOT NULL,
	"thickness_mm" double precision NOT NULL,
	"material" text NOT NULL,
	"grain" "grain_rule" DEFAULT 'along-length' NOT NULL,
	"joint_allowance_mm" double precision DEFAULT 0 NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"drawer_schedule_id" uuid,
	"role" text,
	"machining" jsonb,
	"sort" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "parts_quantity_positive" CHECK ("parts"."quantity" > 0),
	CONSTRAINT "parts_sizes_positive" CHECK ("parts"."length_mm" > 0 and "parts"."width_mm" > 0 and "parts"."thickness_mm" > 0)
);
--> statement-breakpoint
CREATE TABLE "setup_cards" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"joint" text NOT NULL,
	"stock_thickness_mm" double precision NOT NULL,
	"fields" jsonb NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "offcuts" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"material" text NOT NULL,
	"thickness_mm" double precision NOT NULL,
	"length_mm" double precision NOT NULL,
	"width_mm" double precision NOT NULL,
	"grain" "stock_grain" DEFAULT 'along-length' NOT NULL,
	"status" "offcut_status" DEFAULT 'available' NOT NULL,
	"location" text DEFAULT '' NOT NULL,
	"source_plan_id" uuid,
	"source_piece" text,
	"cost_cents" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "stock_items" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"kind" "stock_kind" NOT NULL,
	"material" text NOT NULL,
	"nominal_thickness" text NOT NULL,
	"thickness_mm" double precision NOT NULL,
	"length_mm" double precision NOT NULL,
	"width_mm" double precision NOT NULL,
	"grain" "stock_grain" DEFAULT 'along-length' NOT NULL,
	"surfacing" text DEFAULT '' NOT NULL,
	"grade" text DEFAULT '' NOT NULL,
	"on_hand" integer DEFAULT 0 NOT NULL,
	"reserved" integer DEFAULT 0 NOT NULL,
	"low_stock_at" integer DEFAULT 0 NOT NULL,
	"cost_cents" integer DEFAULT 0 NOT NULL,
	"supplier" text DEFAULT '' NOT NULL,
	"location" text DEFAULT '' NOT NULL,
	"buyable" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stock_on_hand_nonnegative" CHECK ("stock_items"."on_hand" >= 0),
	CONSTRAINT "stock_reserved_within_on_hand" CHECK ("stock_items"."reserved" >= 0 and "stock_items"."reserved" <= "stock_items"."on_hand"),
	CONSTRAINT "stock_sizes_positive" CHECK ("stock_items"."length_mm" > 0 and "stock_items"."width_mm" > 0 and "stock_items"."thickness_mm" > 0)
);
--> statement-breakpoint
CREATE TABLE "stock_movements" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"kind" "movement_kind" NOT NULL,
	"stock_item_id" uuid,
	"offcut_id" uuid,
	"quantity" integer NOT NULL,
	"plan_id" uuid,
	"user_id" uuid,
	"reason" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "stock_movements_target" CHECK (("stock_movements"."stock_item_id" is null) <> ("stock_movements"."offcut_id" is null))
);
--> statement-breakpoint
CREATE TABLE "audit_events" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"user_id" uuid,
	"action" text NOT NULL,
	"entity" text NOT NULL,
	"entity_id" text,
	"data" jsonb,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "placements" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"plan_piece_id" uuid NOT NULL,
	"part_id" uuid,
	"instance" integer NOT NULL,
	"x_mm" double precision NOT NULL,
	"y_mm" double precision NOT NULL,
	"length_mm" double precision NOT NULL,
	"width_mm" double precision NOT NULL,
	"rotated" boolean DEFAULT false NOT NULL,
	"locked" boolean DEFAULT false NOT NULL,
	"damaged" boolean DEFAULT false NOT NULL
);
--> statement-breakpoint
CREATE TABLE "plan_pieces" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"plan_id" uuid NOT NULL,
	"index" integer NOT NULL,
	"stock_item_id" uuid,
	"offcut_id" uuid,
	"material" text NOT NULL,
	"thickness_mm" double precision NOT NULL,
	"length_mm" double precision NOT NULL,
	"width_mm" double precision NOT NULL,
	"to_buy" boolean DEFAULT false NOT NULL
);
--> statement-breakpoint
CREATE TABLE "plans" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"name" text DEFAULT 'Plan' NOT NULL,
	"status" "plan_status" DEFAULT 'draft' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"request" jsonb NOT NULL,
	"document" jsonb NOT NULL,
	"yield_ratio" double precision,
	"cost_cents" integer,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "saw_steps" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"plan_id" uuid NOT NULL,
	"piece_index" integer NOT NULL,
	"seq" integer NOT NULL,
	"done_at" timestamp with time zone DEFAULT now() NOT NULL,
	"done_by" uuid
);
--> statement-breakpoint
ALTER TABLE "users" ADD CONSTRAINT "users_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "jobs" ADD CONSTRAINT "jobs_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drawer_schedules" ADD CONSTRAINT "drawer_schedules_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "drawer_schedules" ADD CONSTRAINT "drawer_schedules_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "parts" ADD CONSTRAINT "parts_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "parts" ADD CONSTRAINT "parts_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "parts" ADD CONSTRAINT "parts_drawer_schedule_id_drawer_schedules_id_fk" FOREIGN KEY ("drawer_schedule_id") REFERENCES "public"."drawer_schedules"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "setup_cards" ADD CONSTRAINT "setup_cards_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "offcuts" ADD CONSTRAINT "offcuts_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_items" ADD CONSTRAINT "stock_items_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_stock_item_id_stock_items_id_fk" FOREIGN KEY ("stock_item_id") REFERENCES "public"."stock_items"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_offcut_id_offcuts_id_fk" FOREIGN KEY ("offcut_id") REFERENCES "public"."offcuts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD CONSTRAINT "stock_movements_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "placements" ADD CONSTRAINT "placements_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "placements" ADD CONSTRAINT "placements_plan_piece_id_plan_pieces_id_fk" FOREIGN KEY ("plan_piece_id") REFERENCES "public"."plan_pieces"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_pieces" ADD CONSTRAINT "plan_pieces_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plan_pieces" ADD CONSTRAINT "plan_pieces_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "saw_steps" ADD CONSTRAINT "saw_steps_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "saw_steps" ADD CONSTRAINT "saw_steps_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "saw_steps" ADD CONSTRAINT "saw_steps_done_by_users_id_fk" FOREIGN KEY ("done_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "users_email_key" ON "users" USING btree (lower("email"));--> statement-breakpoint
CREATE INDEX "users_shop_idx" ON "users" USING btree ("shop_id");--> statement-breakpoint
CREATE INDEX "jobs_shop_idx" ON "jobs" USING btree ("shop_id");--> statement-breakpoint
CREATE INDEX "drawer_schedules_job_idx" ON "drawer_schedules" USING btree ("shop_id","job_id");--> statement-breakpoint
CREATE INDEX "parts_job_idx" ON "parts" USING btree ("shop_id","job_id");--> statement-breakpoint
CREATE INDEX "setup_cards_shop_idx" ON "setup_cards" USING btree ("shop_id");--> statement-breakpoint
CREATE INDEX "offcuts_shop_idx" ON "offcuts" USING btree ("shop_id","status");--> statement-breakpoint
CREATE INDEX "stock_items_shop_idx" ON "stock_items" USING btree ("shop_id");--> statement-breakpoint
CREATE INDEX "stock_movements_shop_idx" ON "stock_movements" USING btree ("shop_id","created_at");--> statement-breakpoint
CREATE INDEX "audit_events_shop_idx" ON "audit_events" USING btree ("shop_id","created_at");--> statement-breakpoint
CREATE INDEX "placements_piece_idx" ON "placements" USING btree ("plan_piece_id");--> statement-breakpoint
CREATE INDEX "plan_pieces_plan_idx" ON "plan_pieces" USING btree ("plan_id");--> statement-breakpoint
CREATE INDEX "plans_job_idx" ON "plans" USING btree ("shop_id","job_id");--> statement-breakpoint
CREATE UNIQUE INDEX "saw_steps_step_key" ON "saw_steps" USING btree ("plan_id","piece_index","seq");