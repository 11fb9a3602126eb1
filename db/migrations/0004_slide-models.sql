CREATE TABLE "slide_models" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"name" text NOT NULL,
	"lengths_mm" jsonb NOT NULL,
	"width_rule" text NOT NULL,
	"width_deduction_mm" double precision NOT NULL,
	"max_side_thickness_mm" double precision,
	"bottom_recess_mm" double precision DEFAULT 0 NOT NULL,
	"height_clearance_mm" double precision NOT NULL,
	"rear_clearance_mm" double precision NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "slide_models" ADD CONSTRAINT "slide_models_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "slide_models_shop_name_idx" ON "slide_models" USING btree ("shop_id","name");