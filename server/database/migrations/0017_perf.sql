CREATE TABLE "qualified_ranges" (
	"test_id" integer NOT NULL,
	"process" text NOT NULL,
	"welder_id" integer NOT NULL,
	"code" text NOT NULL,
	"edition" text NOT NULL,
	"unit" text DEFAULT 'in' NOT NULL,
	"rules_version" integer NOT NULL,
	"derived" boolean NOT NULL,
	"weld" text NOT NULL,
	"positions_groove" text[],
	"positions_groove_pipe" text[],
	"positions_fillet" text[],
	"deposit_max_micro" bigint,
	"thickness_min_micro" bigint,
	"thickness_max_micro" bigint,
	"diameter_min_micro" bigint,
	"f_numbers" integer[],
	"f_without_backing" boolean,
	"backing" boolean,
	"transfer" text,
	"progression" text,
	CONSTRAINT "qualified_ranges_test_id_process_pk" PRIMARY KEY("test_id","process")
);
--> statement-breakpoint
CREATE TABLE "qualified_ranges_refresh" (
	"test_id" integer PRIMARY KEY NOT NULL
);
--> statement-breakpoint
ALTER TABLE "qualified_ranges" ADD CONSTRAINT "qualified_ranges_test_id_welder_tests_id_fk" FOREIGN KEY ("test_id") REFERENCES "public"."welder_tests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "qualified_ranges_process_idx" ON "qualified_ranges" USING btree ("process","welder_id");--> statement-breakpoint
CREATE INDEX "qualified_ranges_rules_idx" ON "qualified_ranges" USING btree ("rules_version");--> statement-breakpoint
-- hand-written (perf)
-- Any change to a welder test marks it for its qualified ranges to be derived again (server/database/qualified-ranges.ts).
CREATE OR REPLACE FUNCTION mark_qualified_ranges_refresh() RETURNS trigger AS $$
BEGIN
  IF TG_OP IN ('UPDATE', 'DELETE') THEN
    INSERT INTO qualified_ranges_refresh (test_id) VALUES (OLD.id) ON CONFLICT DO NOTHING;
  END IF;
  IF TG_OP IN ('INSERT', 'UPDATE') THEN
    INSERT INTO qualified_ranges_refresh (test_id) VALUES (NEW.id) ON CONFLICT DO NOTHING;
  END IF;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER welder_tests_qualified_ranges AFTER INSERT OR UPDATE OR DELETE ON welder_tests
  FOR EACH ROW EXECUTE FUNCTION mark_qualified_ranges_refresh();
--> statement-breakpoint
-- Tests certified before this migration are marked once, so start-up (or the first read) derives them.
INSERT INTO qualified_ranges_refresh (test_id) SELECT id FROM welder_tests WHERE status = 'certified' ON CONFLICT DO NOTHING;
