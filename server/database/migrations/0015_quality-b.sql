CREATE TABLE "equipment" (
	"id" serial PRIMARY KEY NOT NULL,
	"kind" text NOT NULL,
	"tag" text NOT NULL,
	"description" text,
	"serial_number" text,
	"state" text DEFAULT 'in-service' NOT NULL,
	"calibrated_on" date,
	"interval_months" integer,
	"notes" text,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "equipment_kind_check" CHECK ("equipment"."kind" in ('welding-machine', 'ammeter', 'voltmeter', 'wire-feed-speed-meter', 'gas-flow-meter', 'temperature-indicator')),
	CONSTRAINT "equipment_state_check" CHECK ("equipment"."state" in ('in-service', 'out-of-service')),
	CONSTRAINT "equipment_interval_check" CHECK ("equipment"."interval_months" is null or "equipment"."interval_months" between 1 and 120)
);
--> statement-breakpoint
CREATE TABLE "imported_documents" (
	"id" serial PRIMARY KEY NOT NULL,
	"kind" text NOT NULL,
	"number" text NOT NULL,
	"revision" text DEFAULT '' NOT NULL,
	"title" text,
	"code" text NOT NULL,
	"edition" text,
	"processes" text,
	"document_date" date,
	"status" text,
	"imported_by" integer,
	"imported_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "imported_documents_kind_check" CHECK ("imported_documents"."kind" in ('wps', 'pqr'))
);
--> statement-breakpoint
CREATE TABLE "imported_tests" (
	"id" serial PRIMARY KEY NOT NULL,
	"welder_id" integer NOT NULL,
	"code" text NOT NULL,
	"edition" text,
	"process" text NOT NULL,
	"test_date" date NOT NULL,
	"positions" text,
	"thickness" text,
	"diameter" text,
	"other_ranges" text,
	"reference" text,
	"state" text DEFAULT 'imported' NOT NULL,
	"imported_by" integer,
	"imported_at" timestamp with time zone DEFAULT now() NOT NULL,
	"confirmed_by" integer,
	"confirmed_at" timestamp with time zone,
	CONSTRAINT "imported_tests_state_check" CHECK ("imported_tests"."state" in ('imported', 'confirmed'))
);
--> statement-breakpoint
CREATE TABLE "reading_equipment" (
	"reading_id" integer NOT NULL,
	"equipment_id" integer NOT NULL,
	"calibration_state" text NOT NULL,
	"due_on" date,
	CONSTRAINT "reading_equipment_reading_id_equipment_id_pk" PRIMARY KEY("reading_id","equipment_id")
);
--> statement-breakpoint
ALTER TABLE "readings" ADD COLUMN "calibration_flag" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "welders" ADD COLUMN "card_token" text;--> statement-breakpoint
ALTER TABLE "welders" ADD COLUMN "card_public" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "imported_documents" ADD CONSTRAINT "imported_documents_imported_by_accounts_id_fk" FOREIGN KEY ("imported_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "imported_tests" ADD CONSTRAINT "imported_tests_welder_id_welders_id_fk" FOREIGN KEY ("welder_id") REFERENCES "public"."welders"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "imported_tests" ADD CONSTRAINT "imported_tests_imported_by_accounts_id_fk" FOREIGN KEY ("imported_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "imported_tests" ADD CONSTRAINT "imported_tests_confirmed_by_accounts_id_fk" FOREIGN KEY ("confirmed_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reading_equipment" ADD CONSTRAINT "reading_equipment_reading_id_readings_id_fk" FOREIGN KEY ("reading_id") REFERENCES "public"."readings"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "reading_equipment" ADD CONSTRAINT "reading_equipment_equipment_id_equipment_id_fk" FOREIGN KEY ("equipment_id") REFERENCES "public"."equipment"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "equipment_tag_key" ON "equipment" USING btree ("tag");--> statement-breakpoint
CREATE UNIQUE INDEX "imported_documents_number_key" ON "imported_documents" USING btree ("kind","number","revision");--> statement-breakpoint
CREATE INDEX "imported_tests_welder_idx" ON "imported_tests" USING btree ("welder_id","test_date");--> statement-breakpoint
CREATE INDEX "reading_equipment_equipment_idx" ON "reading_equipment" USING btree ("equipment_id");--> statement-breakpoint
CREATE UNIQUE INDEX "welders_card_token_key" ON "welders" USING btree ("card_token");