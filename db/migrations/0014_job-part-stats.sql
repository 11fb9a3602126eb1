ALTER TABLE "jobs" ADD COLUMN "part_pieces" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
ALTER TABLE "jobs" ADD COLUMN "part_materials" text[] DEFAULT '{}'::text[] NOT NULL;--> statement-breakpoint
-- Hand-written: the trigger that keeps jobs.part_pieces and jobs.part_materials, once per statement on parts, for
-- the jobs that statement touched (a part moved to another job counts for both), and the figures of the parts already there.
CREATE FUNCTION "kerfwise_job_part_stats"() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  touched uuid[];
BEGIN
  IF TG_OP = 'INSERT' THEN
    touched := array(SELECT DISTINCT job_id FROM new_parts);
  ELSIF TG_OP = 'DELETE' THEN
    touched := array(SELECT DISTINCT job_id FROM old_parts);
  ELSE
    touched := array(SELECT job_id FROM new_parts UNION SELECT job_id FROM old_parts);
  END IF;
  UPDATE "jobs" j
     SET part_pieces = coalesce((SELECT sum(p.quantity) FROM "parts" p WHERE p.shop_id = j.shop_id AND p.job_id = j.id), 0),
         part_materials = coalesce((SELECT array_agg(DISTINCT p.material) FROM "parts" p WHERE p.shop_id = j.shop_id AND p.job_id = j.id), '{}')
   WHERE j.id = ANY (touched);
  RETURN NULL;
END
$$;
--> statement-breakpoint
CREATE TRIGGER "kerfwise_job_part_stats_insert" AFTER INSERT ON "parts" REFERENCING NEW TABLE AS new_parts FOR EACH STATEMENT EXECUTE FUNCTION "kerfwise_job_part_stats"();
--> statement-breakpoint
CREATE TRIGGER "kerfwise_job_part_stats_update" AFTER UPDATE ON "parts" REFERENCING OLD TABLE AS old_parts NEW TABLE AS new_parts FOR EACH STATEMENT EXECUTE FUNCTION "kerfwise_job_part_stats"();
--> statement-breakpoint
CREATE TRIGGER "kerfwise_job_part_stats_delete" AFTER DELETE ON "parts" REFERENCING OLD TABLE AS old_parts FOR EACH STATEMENT EXECUTE FUNCTION "kerfwise_job_part_stats"();
--> statement-breakpoint
UPDATE "jobs" j
   SET part_pieces = s.pieces, part_materials = s.materials
  FROM (SELECT shop_id, job_id, sum(quantity)::int AS pieces, array_agg(DISTINCT material) AS materials FROM "parts" GROUP BY shop_id, job_id) s
 WHERE j.shop_id = s.shop_id AND j.id = s.job_id;
