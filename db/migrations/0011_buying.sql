CREATE TYPE "public"."purchase_order_status" AS ENUM('draft', 'sent', 'part-received', 'received', 'cancelled');--> statement-breakpoint
CREATE TABLE "low_stock_digests" (
	"shop_id" uuid NOT NULL,
	"day" text NOT NULL,
	"sizes" integer NOT NULL,
	"mail_id" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "low_stock_digests_shop_id_day_pk" PRIMARY KEY("shop_id","day")
);
--> statement-breakpoint
CREATE TABLE "purchase_order_lines" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"purchase_order_id" uuid NOT NULL,
	"stock_item_id" uuid NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	"quantity" integer NOT NULL,
	"unit_cost_cents" integer NOT NULL,
	"received" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "purchase_order_lines_quantity_positive" CHECK ("purchase_order_lines"."quantity" > 0 and "purchase_order_lines"."quantity" <= 100000),
	CONSTRAINT "purchase_order_lines_cost_nonnegative" CHECK ("purchase_order_lines"."unit_cost_cents" >= 0),
	CONSTRAINT "purchase_order_lines_received_within" CHECK ("purchase_order_lines"."received" >= 0 and "purchase_order_lines"."received" <= "purchase_order_lines"."quantity")
);
--> statement-breakpoint
CREATE TABLE "purchase_orders" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"number" integer NOT NULL,
	"supplier" text NOT NULL,
	"supplier_email" text DEFAULT '' NOT NULL,
	"status" "purchase_order_status" DEFAULT 'draft' NOT NULL,
	"source" text DEFAULT 'manual' NOT NULL,
	"plan_id" uuid,
	"currency" text NOT NULL,
	"note" text DEFAULT '' NOT NULL,
	"sent_at" timestamp with time zone,
	"received_at" timestamp with time zone,
	"cancelled_at" timestamp with time zone,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "purchase_orders_source_check" CHECK ("purchase_orders"."source" in ('plan', 'low-stock', 'manual'))
);
--> statement-breakpoint
CREATE TABLE "suppliers" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"name" text NOT NULL,
	"email" text DEFAULT '' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "shops" ADD COLUMN "purchase_order_details" text DEFAULT '' NOT NULL;--> statement-breakpoint
ALTER TABLE "shops" ADD COLUMN "low_stock_digest_time" text DEFAULT '07:00' NOT NULL;--> statement-breakpoint
ALTER TABLE "stock_movements" ADD COLUMN "purchase_order_id" uuid;--> statement-breakpoint
ALTER TABLE "low_stock_digests" ADD CONSTRAINT "low_stock_digests_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "low_stock_digests" ADD CONSTRAINT "low_stock_digests_mail_id_mail_outbox_id_fk" FOREIGN KEY ("mail_id") REFERENCES "public"."mail_outbox"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_order_lines" ADD CONSTRAINT "purchase_order_lines_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_order_lines" ADD CONSTRAINT "purchase_order_lines_purchase_order_id_purchase_orders_id_fk" FOREIGN KEY ("purchase_order_id") REFERENCES "public"."purchase_orders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_order_lines" ADD CONSTRAINT "purchase_order_lines_stock_item_id_stock_items_id_fk" FOREIGN KEY ("stock_item_id") REFERENCES "public"."stock_items"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_orders" ADD CONSTRAINT "purchase_orders_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_orders" ADD CONSTRAINT "purchase_orders_plan_id_plans_id_fk" FOREIGN KEY ("plan_id") REFERENCES "public"."plans"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "purchase_orders" ADD CONSTRAINT "purchase_orders_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "suppliers" ADD CONSTRAINT "suppliers_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "purchase_order_lines_order_item_key" ON "purchase_order_lines" USING btree ("purchase_order_id","stock_item_id");--> statement-breakpoint
CREATE INDEX "purchase_order_lines_item_idx" ON "purchase_order_lines" USING btree ("shop_id","stock_item_id");--> statement-breakpoint
CREATE UNIQUE INDEX "purchase_orders_shop_number_key" ON "purchase_orders" USING btree ("shop_id","number");--> statement-breakpoint
CREATE INDEX "purchase_orders_shop_status_idx" ON "purchase_orders" USING btree ("shop_id","status");--> statement-breakpoint
CREATE UNIQUE INDEX "suppliers_shop_name_key" ON "suppliers" USING btree ("shop_id",lower("name"));