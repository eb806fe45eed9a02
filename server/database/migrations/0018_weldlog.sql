ALTER TABLE "issued_sheets" DROP CONSTRAINT "issued_sheets_kind_check";--> statement-breakpoint
ALTER TABLE "issued_sheets" ALTER COLUMN "welder_id" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "issued_sheets" ALTER COLUMN "period_from" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "issued_sheets" ALTER COLUMN "period_to" DROP NOT NULL;--> statement-breakpoint
ALTER TABLE "issued_sheets" ADD COLUMN "project_id" integer;--> statement-breakpoint
ALTER TABLE "issued_sheets" ADD CONSTRAINT "issued_sheets_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "issued_sheets_project_idx" ON "issued_sheets" USING btree ("kind","project_id","sha256");--> statement-breakpoint
ALTER TABLE "issued_sheets" ADD CONSTRAINT "issued_sheets_subject_check" CHECK (("issued_sheets"."kind" = 'continuity-log' and "issued_sheets"."welder_id" is not null and "issued_sheets"."period_from" is not null and "issued_sheets"."period_to" is not null)
    or ("issued_sheets"."kind" = 'weld-register' and "issued_sheets"."project_id" is not null));--> statement-breakpoint
ALTER TABLE "issued_sheets" ADD CONSTRAINT "issued_sheets_kind_check" CHECK ("issued_sheets"."kind" in ('continuity-log', 'weld-register'));--> statement-breakpoint
-- hand-written (weldlog)
-- Every issued weld register moves into issued_sheets with its code, hash, issuer and time unchanged (drizzle-kit put
-- the table's drop first; it is here, after the move, so no row is lost).
INSERT INTO "issued_sheets" ("kind", "project_id", "sha256", "verify_code", "issued_by", "issuer_name", "issued_at")
  SELECT 'weld-register', "project_id", "sha256", "verify_code", "issued_by", "issuer_name", "issued_at" FROM "issued_registers" ORDER BY "id";--> statement-breakpoint
DROP TABLE "issued_registers" CASCADE;
