-- Lengths are named for what they measure, not their unit (every length is mm): stored JSON written with the older
-- names (a key ending in "Mm", such as "widthMm" in a drawer schedule or "kerfMm" in a nest request's saw) takes the
-- name without the suffix. Areas ("…Mm2") keep theirs.
CREATE FUNCTION kerfwise_drop_mm_suffix(doc jsonb) RETURNS jsonb LANGUAGE plpgsql IMMUTABLE AS $$
DECLARE
  out jsonb;
  k text;
  v jsonb;
BEGIN
  IF jsonb_typeof(doc) = 'object' THEN
    out := '{}'::jsonb;
    FOR k, v IN SELECT * FROM jsonb_each(doc) LOOP
      IF k ~ '^[a-z][A-Za-z0-9_]*Mm$' THEN
        k := left(k, length(k) - 2);
      END IF;
      out := out || jsonb_build_object(k, kerfwise_drop_mm_suffix(v));
    END LOOP;
    RETURN out;
  ELSIF jsonb_typeof(doc) = 'array' THEN
    SELECT coalesce(jsonb_agg(kerfwise_drop_mm_suffix(e) ORDER BY i), '[]'::jsonb) INTO out
      FROM jsonb_array_elements(doc) WITH ORDINALITY AS a(e, i);
    RETURN out;
  END IF;
  RETURN doc;
END
$$;
--> statement-breakpoint
UPDATE "drawer_schedules" SET "input" = kerfwise_drop_mm_suffix("input") WHERE "input"::text ~ 'Mm"';
--> statement-breakpoint
UPDATE "plans" SET "request" = kerfwise_drop_mm_suffix("request") WHERE "request"::text ~ 'Mm"';
--> statement-breakpoint
UPDATE "audit_events" SET "data" = kerfwise_drop_mm_suffix("data") WHERE "data" IS NOT NULL AND "data"::text ~ 'Mm"';
--> statement-breakpoint
DROP FUNCTION kerfwise_drop_mm_suffix(jsonb);
