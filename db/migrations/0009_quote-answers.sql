CREATE TYPE "public"."payment_status" AS ENUM('open', 'paid', 'expired', 'refunded');--> statement-breakpoint
ALTER TYPE "public"."quote_revision_status" ADD VALUE 'accepted';--> statement-breakpoint
ALTER TYPE "public"."quote_revision_status" ADD VALUE 'declined';--> statement-breakpoint
ALTER TYPE "public"."quote_revision_status" ADD VALUE 'expired';--> statement-breakpoint
CREATE TABLE "payment_events" (
	"id" text PRIMARY KEY NOT NULL,
	"type" text NOT NULL,
	"payment_id" uuid,
	"outcome" text NOT NULL,
	"received_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "quote_payments" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"shop_id" uuid NOT NULL,
	"revision_id" uuid NOT NULL,
	"job_id" uuid NOT NULL,
	"checkout_session_id" text NOT NULL,
	"payment_intent_id" text,
	"amount_minor" integer NOT NULL,
	"currency" text NOT NULL,
	"status" "payment_status" DEFAULT 'open' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"paid_at" timestamp with time zone,
	"refunded_at" timestamp with time zone
);
--> statement-breakpoint
-- Hand-written: the job statuses grow (a won job is now "accepted", as the customer's page says it), kept in place.
ALTER TYPE "public"."job_status" RENAME VALUE 'won' TO 'accepted';--> statement-breakpoint
ALTER TYPE "public"."job_status" ADD VALUE 'deposit-paid' AFTER 'accepted';--> statement-breakpoint
ALTER TYPE "public"."job_status" ADD VALUE 'declined' AFTER 'done';--> statement-breakpoint
ALTER TYPE "public"."job_status" ADD VALUE 'expired' AFTER 'declined';--> statement-breakpoint
ALTER TABLE "jobs" RENAME COLUMN "won_at" TO "accepted_at";--> statement-breakpoint
ALTER TABLE "quote_revisions" ADD COLUMN "link_token_hash" text;--> statement-breakpoint
ALTER TABLE "quote_revisions" ADD COLUMN "valid_until" date;--> statement-breakpoint
ALTER TABLE "quote_revisions" ADD COLUMN "answered_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "quote_revisions" ADD COLUMN "accepted_name" text;--> statement-breakpoint
ALTER TABLE "quote_revisions" ADD COLUMN "answered_from" text;--> statement-breakpoint
ALTER TABLE "quote_revisions" ADD COLUMN "decline_reason" text;--> statement-breakpoint
ALTER TABLE "payment_events" ADD CONSTRAINT "payment_events_payment_id_quote_payments_id_fk" FOREIGN KEY ("payment_id") REFERENCES "public"."quote_payments"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_payments" ADD CONSTRAINT "quote_payments_shop_id_shops_id_fk" FOREIGN KEY ("shop_id") REFERENCES "public"."shops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_payments" ADD CONSTRAINT "quote_payments_revision_id_quote_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."quote_revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "quote_payments" ADD CONSTRAINT "quote_payments_job_id_jobs_id_fk" FOREIGN KEY ("job_id") REFERENCES "public"."jobs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "quote_payments_session_idx" ON "quote_payments" USING btree ("checkout_session_id");--> statement-breakpoint
CREATE INDEX "quote_payments_revision_idx" ON "quote_payments" USING btree ("revision_id");--> statement-breakpoint
CREATE INDEX "quote_payments_job_idx" ON "quote_payments" USING btree ("job_id");--> statement-breakpoint
CREATE INDEX "quote_payments_intent_idx" ON "quote_payments" USING btree ("payment_intent_id");--> statement-breakpoint
CREATE UNIQUE INDEX "quote_revisions_link_token_idx" ON "quote_revisions" USING btree ("link_token_hash");--> statement-breakpoint
-- Hand-written: a revision sent before this migration keeps the validity it was sent with, as a date in the shop's zone.
UPDATE "quote_revisions" SET "valid_until" = (("quote_revisions"."sent_at" AT TIME ZONE "shops"."time_zone")::date + "quote_revisions"."validity_days")
  FROM "shops" WHERE "shops"."id" = "quote_revisions"."shop_id" AND "quote_revisions"."sent_at" IS NOT NULL;