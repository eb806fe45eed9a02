CREATE TABLE "iso_validity_records" (
	"id" serial PRIMARY KEY NOT NULL,
	"test_id" integer NOT NULL,
	"kind" text NOT NULL,
	"on" date NOT NULL,
	"confirmer" text NOT NULL,
	"statement" text NOT NULL,
	"reference" text,
	"signer_id" integer NOT NULL,
	"signer_name" text NOT NULL,
	"sha256" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "iso_validity_records_kind_check" CHECK ("iso_validity_records"."kind" in ('confirmation', 'production-welds')),
	CONSTRAINT "iso_validity_records_confirmer_check" CHECK ("iso_validity_records"."confirmer" in ('coordinator', 'examiner'))
);
--> statement-breakpoint
ALTER TABLE "signatures" DROP CONSTRAINT "signatures_content_format_check";--> statement-breakpoint
ALTER TABLE "welder_tests" ADD COLUMN "iso" jsonb;--> statement-breakpoint
ALTER TABLE "iso_validity_records" ADD CONSTRAINT "iso_validity_records_test_id_welder_tests_id_fk" FOREIGN KEY ("test_id") REFERENCES "public"."welder_tests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "iso_validity_records" ADD CONSTRAINT "iso_validity_records_signer_id_accounts_id_fk" FOREIGN KEY ("signer_id") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "iso_validity_records_test_idx" ON "iso_validity_records" USING btree ("test_id","on");--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_content_format_check" CHECK ("signatures"."content_format" in (1, 2, 3));--> statement-breakpoint
-- hand-written (iso)
-- A 9.2 confirmation or a 9.3 b) record marks its test's welder × each process for recomputation (records are never edited).
CREATE OR REPLACE FUNCTION mark_iso_validity_refresh() RETURNS trigger AS $$
BEGIN
  INSERT INTO standing_refresh (welder_id, process)
    SELECT t.welder_id, p FROM welder_tests t,
      unnest(CASE WHEN cardinality(t.processes) > 0 THEN t.processes ELSE ARRAY[t.process] END) AS p
    WHERE t.id = NEW.test_id
    ON CONFLICT DO NOTHING;
  RETURN NULL;
END;
$$ LANGUAGE plpgsql;
--> statement-breakpoint
CREATE TRIGGER iso_validity_records_standing AFTER INSERT ON iso_validity_records
  FOR EACH ROW EXECUTE FUNCTION mark_iso_validity_refresh();
