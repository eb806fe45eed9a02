ALTER TABLE "pqrs" ADD COLUMN "base_metal_b_id" integer;--> statement-breakpoint
ALTER TABLE "pqrs" ADD COLUMN "welder_id" integer;--> statement-breakpoint
ALTER TABLE "pqrs" ADD COLUMN "processes" text[] DEFAULT '{}'::text[] NOT NULL;--> statement-breakpoint
ALTER TABLE "pqrs" ADD COLUMN "layers" jsonb DEFAULT '[]'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "procedures" ADD COLUMN "processes" text[] DEFAULT '{}'::text[] NOT NULL;--> statement-breakpoint
ALTER TABLE "procedures" ADD COLUMN "layers" jsonb DEFAULT '[]'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "signatures" ADD COLUMN "content_format" integer DEFAULT 1 NOT NULL;--> statement-breakpoint
ALTER TABLE "welder_tests" ADD COLUMN "processes" text[] DEFAULT '{}'::text[] NOT NULL;--> statement-breakpoint
ALTER TABLE "welder_tests" ADD COLUMN "deposits" jsonb DEFAULT '[]'::jsonb NOT NULL;--> statement-breakpoint
ALTER TABLE "welder_tests" ADD COLUMN "pqr_id" integer;--> statement-breakpoint
ALTER TABLE "pqrs" ADD CONSTRAINT "pqrs_base_metal_b_id_base_metals_id_fk" FOREIGN KEY ("base_metal_b_id") REFERENCES "public"."base_metals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pqrs" ADD CONSTRAINT "pqrs_welder_id_welders_id_fk" FOREIGN KEY ("welder_id") REFERENCES "public"."welders"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "welder_tests" ADD CONSTRAINT "welder_tests_pqr_id_pqrs_id_fk" FOREIGN KEY ("pqr_id") REFERENCES "public"."pqrs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "procedures_processes_idx" ON "procedures" USING gin ("processes");--> statement-breakpoint
ALTER TABLE "pqrs" ADD CONSTRAINT "pqrs_layers_check" CHECK (jsonb_typeof("pqrs"."layers") = 'array');--> statement-breakpoint
ALTER TABLE "procedures" ADD CONSTRAINT "procedures_layers_check" CHECK (jsonb_typeof("procedures"."layers") = 'array');--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_content_format_check" CHECK ("signatures"."content_format" in (1, 2));--> statement-breakpoint
ALTER TABLE "welder_tests" ADD CONSTRAINT "welder_tests_deposits_check" CHECK (jsonb_typeof("welder_tests"."deposits") = 'array');--> statement-breakpoint
-- Records made before process layers become one-layer records. The columns a signature of content format 1 covers are
-- left as they were, so every sheet signed before keeps verifying (server/database/signing.ts).
UPDATE "procedures" SET
  "processes" = ARRAY["process"],
  "layers" = jsonb_build_array(jsonb_strip_nulls(jsonb_build_object(
    'name', 'all passes', 'process', "process", 'transfer', "transfer",
    'fillers', (SELECT coalesce(jsonb_agg(f.value || jsonb_build_object('fNumber', coalesce(f.value->>'fNumber', "f_numbers"[f.ordinality], "f_numbers"[1])) ORDER BY f.ordinality), '[]'::jsonb)
      FROM jsonb_array_elements(CASE WHEN jsonb_typeof("variables"->'fillers') = 'array' THEN "variables"->'fillers' ELSE '[]'::jsonb END) WITH ORDINALITY AS f(value, ordinality)),
    'depositMax', "variables"->'depositMax',
    'current', "variables"#>'{electrical,current}',
    'amps', "variables"#>'{electrical,amps}',
    'volts', "variables"#>'{electrical,volts}',
    'wireFeed', "variables"#>'{electrical,wireFeed}',
    'travelSpeed', "variables"#>'{electrical,travelSpeed}',
    'heatInputMax', "variables"#>'{electrical,heatInputMax}',
    'ctwd', "variables"#>'{technique,ctwd}',
    'bead', "variables"#>'{technique,bead}',
    'gas', "variables"->'gas')))
WHERE "layers" = '[]'::jsonb;
--> statement-breakpoint
UPDATE "pqrs" SET
  "processes" = ARRAY["process"],
  "layers" = jsonb_build_array(jsonb_strip_nulls(
    (CASE WHEN jsonb_typeof("actuals") = 'object' THEN "actuals" ELSE '{}'::jsonb END) - 'position' - 'progression' - 'preheat' - 'interpass' - 'pwht'
    || jsonb_build_object('name', 'all passes', 'process', "process", 'transfer', "transfer", 'fillerMetalId', "filler_metal_id", 'depositThickness', "deposit_thickness")))
WHERE "layers" = '[]'::jsonb;
--> statement-breakpoint
UPDATE "welder_tests" SET
  "processes" = ARRAY["process"],
  "deposits" = jsonb_build_array(jsonb_build_object('process', "process", 'transfer', "transfer", 'depositThickness', "deposit_thickness"))
WHERE "deposits" = '[]'::jsonb;
--> statement-breakpoint
-- A combination coupon counts for each of its processes: a change to a test marks every process it lists.
CREATE OR REPLACE FUNCTION mark_test_standing_refresh() RETURNS trigger AS $$
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') THEN
    INSERT INTO standing_refresh (welder_id, process)
      SELECT DISTINCT OLD.welder_id, p FROM unnest(array_append(OLD.processes, OLD.process)) AS p ON CONFLICT DO NOTHING;
  END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') THEN
    INSERT INTO standing_refresh (welder_id, process)
      SELECT DISTINCT NEW.welder_id, p FROM unnest(array_append(NEW.processes, NEW.process)) AS p ON CONFLICT DO NOTHING;
  END IF;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
DROP TRIGGER IF EXISTS welder_tests_standing ON welder_tests;
--> statement-breakpoint
CREATE TRIGGER welder_tests_standing AFTER INSERT OR UPDATE OR DELETE ON welder_tests
  FOR EACH ROW EXECUTE FUNCTION mark_test_standing_refresh();
