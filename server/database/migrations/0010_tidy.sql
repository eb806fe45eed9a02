CREATE TABLE "continuity_imports" (
	"id" serial PRIMARY KEY NOT NULL,
	"imported_by" integer,
	"rows" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"undone_at" timestamp with time zone,
	"undone_by" integer
);
--> statement-breakpoint
ALTER TABLE "continuity_entries" ADD COLUMN "import_id" integer;--> statement-breakpoint
ALTER TABLE "continuity_imports" ADD CONSTRAINT "continuity_imports_imported_by_accounts_id_fk" FOREIGN KEY ("imported_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "continuity_imports" ADD CONSTRAINT "continuity_imports_undone_by_accounts_id_fk" FOREIGN KEY ("undone_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "continuity_imports_created_idx" ON "continuity_imports" USING btree ("created_at");--> statement-breakpoint
ALTER TABLE "continuity_entries" ADD CONSTRAINT "continuity_entries_import_id_continuity_imports_id_fk" FOREIGN KEY ("import_id") REFERENCES "public"."continuity_imports"("id") ON DELETE no action ON UPDATE no action;