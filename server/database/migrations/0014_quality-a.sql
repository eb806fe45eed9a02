CREATE TABLE "qualification_revocations" (
	"id" serial PRIMARY KEY NOT NULL,
	"welder_id" integer NOT NULL,
	"process" text NOT NULL,
	"revoked_on" date NOT NULL,
	"reason" text NOT NULL,
	"revoked_by" integer NOT NULL,
	"basis_test_id" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "qualification_revocations_reason_check" CHECK (length(trim("qualification_revocations"."reason")) > 0)
);
--> statement-breakpoint
ALTER TABLE "process_standings" ADD COLUMN "revoked_on" date;--> statement-breakpoint
ALTER TABLE "process_standings" ADD COLUMN "revoked_reason" text;--> statement-breakpoint
ALTER TABLE "process_standings" ADD COLUMN "revoked_by" text;--> statement-breakpoint
ALTER TABLE "welder_tests" ADD COLUMN "qualified_as" text DEFAULT 'welder' NOT NULL;--> statement-breakpoint
ALTER TABLE "welder_tests" ADD COLUMN "operator" jsonb;--> statement-breakpoint
ALTER TABLE "qualification_revocations" ADD CONSTRAINT "qualification_revocations_welder_id_welders_id_fk" FOREIGN KEY ("welder_id") REFERENCES "public"."welders"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "qualification_revocations" ADD CONSTRAINT "qualification_revocations_revoked_by_accounts_id_fk" FOREIGN KEY ("revoked_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "qualification_revocations" ADD CONSTRAINT "qualification_revocations_basis_test_id_welder_tests_id_fk" FOREIGN KEY ("basis_test_id") REFERENCES "public"."welder_tests"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "qualification_revocations_welder_idx" ON "qualification_revocations" USING btree ("welder_id","process");--> statement-breakpoint
ALTER TABLE "welder_tests" ADD CONSTRAINT "welder_tests_qualified_as_check" CHECK ("welder_tests"."qualified_as" in ('welder', 'welding-operator'));--> statement-breakpoint
-- hand-written (quality-a)
-- A revocation marks its welder × process like a test or a continuity entry does (mark_standing_refresh of 0006).
CREATE TRIGGER qualification_revocations_standing AFTER INSERT OR UPDATE OR DELETE ON qualification_revocations
  FOR EACH ROW EXECUTE FUNCTION mark_standing_refresh();
