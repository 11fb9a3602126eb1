ALTER TABLE "plans" ADD COLUMN "waste_ratio" double precision;--> statement-breakpoint
ALTER TABLE "plans" ADD COLUMN "released_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "plans" ADD COLUMN "released_by" uuid;--> statement-breakpoint
ALTER TABLE "plans" ADD COLUMN "finished_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "plans" ADD COLUMN "finished_by" uuid;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_released_by_users_id_fk" FOREIGN KEY ("released_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "plans" ADD CONSTRAINT "plans_finished_by_users_id_fk" FOREIGN KEY ("finished_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "offcuts" ADD CONSTRAINT "offcut_sizes_positive" CHECK ("offcuts"."length_mm" > 0 and "offcuts"."width_mm" > 0 and "offcuts"."thickness_mm" > 0);--> statement-breakpoint
ALTER TABLE "offcuts" ADD CONSTRAINT "offcut_cost_nonnegative" CHECK ("offcuts"."cost_cents" >= 0);