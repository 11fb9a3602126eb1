CREATE TABLE "saws" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"kind" text NOT NULL,
	"kind_name" text,
	"name" text NOT NULL,
	"kerf_mm" double precision NOT NULL,
	"rip_capacity_mm" double precision,
	"crosscut_capacity_mm" double precision,
	"max_piece_length_mm" double precision,
	"max_piece_width_mm" double precision,
	"max_stages" integer,
	"first_stage" text DEFAULT 'rip' NOT NULL,
	"min_fence_width_mm" double precision NOT NULL,
	"position" integer DEFAULT 0 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "saws" ADD CONSTRAINT "saws_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "saws_shop_idx" ON "saws" USING btree ("shop_id","position");