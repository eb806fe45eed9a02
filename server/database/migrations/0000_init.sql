CREATE TABLE "accounts" (
	"id" serial PRIMARY KEY NOT NULL,
	"email" text NOT NULL,
	"name" text NOT NULL,
	"role" text NOT NULL,
	"password_hash" text,
	"welder_id" integer,
	"active" boolean DEFAULT true NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "accounts_role_check" CHECK ("accounts"."role" in ('supervisor', 'inspector', 'welder', 'auditor')),
	CONSTRAINT "accounts_welder_link_check" CHECK (("accounts"."role" = 'welder') = ("accounts"."welder_id" is not null))
);
--> statement-breakpoint
CREATE TABLE "attachments" (
	"id" serial PRIMARY KEY NOT NULL,
	"record_type" text NOT NULL,
	"record_id" integer NOT NULL,
	"file_name" text NOT NULL,
	"content_type" text NOT NULL,
	"size" integer NOT NULL,
	"sha256" text NOT NULL,
	"storage_key" text NOT NULL,
	"uploaded_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "attachments_size_check" CHECK ("attachments"."size" > 0)
);
--> statement-breakpoint
CREATE TABLE "audit_events" (
	"id" serial PRIMARY KEY NOT NULL,
	"account_id" integer,
	"action" text NOT NULL,
	"record_type" text NOT NULL,
	"record_id" integer,
	"before" jsonb,
	"after" jsonb,
	"at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "auditor_grants" (
	"account_id" integer NOT NULL,
	"project_id" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "auditor_grants_account_id_project_id_pk" PRIMARY KEY("account_id","project_id")
);
--> statement-breakpoint
CREATE TABLE "base_metals" (
	"id" serial PRIMARY KEY NOT NULL,
	"specification" text NOT NULL,
	"grade" text NOT NULL,
	"p_number" text NOT NULL,
	"group_number" integer,
	"min_tensile_psi" integer
);
--> statement-breakpoint
CREATE TABLE "continuity_entries" (
	"id" serial PRIMARY KEY NOT NULL,
	"welder_id" integer NOT NULL,
	"process" text NOT NULL,
	"welded_on" date NOT NULL,
	"reference" text NOT NULL,
	"recorded_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "customers" (
	"id" serial PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"contact" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "filler_metals" (
	"id" serial PRIMARY KEY NOT NULL,
	"specification" text NOT NULL,
	"classification" text NOT NULL,
	"f_number" text NOT NULL,
	"a_number" text
);
--> statement-breakpoint
CREATE TABLE "packets" (
	"id" serial PRIMARY KEY NOT NULL,
	"project_id" integer NOT NULL,
	"requested_by" integer,
	"status" text DEFAULT 'queued' NOT NULL,
	"progress" integer DEFAULT 0 NOT NULL,
	"page_count" integer,
	"storage_key" text,
	"sha256" text,
	"error" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "packets_status_check" CHECK ("packets"."status" in ('queued', 'building', 'ready', 'failed'))
);
--> statement-breakpoint
CREATE TABLE "pqr_bend_specimens" (
	"id" serial PRIMARY KEY NOT NULL,
	"pqr_id" integer NOT NULL,
	"type" text NOT NULL,
	"largest_indication" double precision DEFAULT 0 NOT NULL,
	"at_corner" boolean DEFAULT false NOT NULL,
	"accepted" boolean NOT NULL,
	CONSTRAINT "pqr_bend_type_check" CHECK ("pqr_bend_specimens"."type" in ('face', 'root', 'side', 'longitudinal-face', 'longitudinal-root')),
	CONSTRAINT "pqr_bend_indication_check" CHECK ("pqr_bend_specimens"."largest_indication" >= 0)
);
--> statement-breakpoint
CREATE TABLE "pqr_tensile_specimens" (
	"id" serial PRIMARY KEY NOT NULL,
	"pqr_id" integer NOT NULL,
	"label" text NOT NULL,
	"width" double precision NOT NULL,
	"thickness" double precision NOT NULL,
	"load" double precision NOT NULL,
	"strength" double precision NOT NULL,
	"break_location" text NOT NULL,
	"accepted" boolean NOT NULL,
	CONSTRAINT "pqr_tensile_positive_check" CHECK ("pqr_tensile_specimens"."width" > 0 and "pqr_tensile_specimens"."thickness" > 0 and "pqr_tensile_specimens"."load" > 0)
);
--> statement-breakpoint
CREATE TABLE "pqrs" (
	"id" serial PRIMARY KEY NOT NULL,
	"number" text NOT NULL,
	"test_date" date NOT NULL,
	"code" text NOT NULL,
	"edition" text NOT NULL,
	"unit" text DEFAULT 'in' NOT NULL,
	"process" text NOT NULL,
	"transfer" text,
	"coupon_thickness" double precision NOT NULL,
	"deposit_thickness" double precision,
	"base_metal_id" integer,
	"filler_metal_id" integer,
	"toughness_required" boolean DEFAULT false NOT NULL,
	"actuals" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"toughness" jsonb,
	"lab_report_number" text,
	"status" text DEFAULT 'recorded' NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "pqrs_status_check" CHECK ("pqrs"."status" in ('recorded', 'certified', 'failed')),
	CONSTRAINT "pqrs_coupon_check" CHECK ("pqrs"."coupon_thickness" > 0),
	CONSTRAINT "pqrs_unit_check" CHECK ("pqrs"."unit" in ('in', 'mm'))
);
--> statement-breakpoint
CREATE TABLE "procedure_pqrs" (
	"procedure_id" integer NOT NULL,
	"pqr_id" integer NOT NULL,
	CONSTRAINT "procedure_pqrs_procedure_id_pqr_id_pk" PRIMARY KEY("procedure_id","pqr_id")
);
--> statement-breakpoint
CREATE TABLE "procedures" (
	"id" serial PRIMARY KEY NOT NULL,
	"number" text NOT NULL,
	"revision" integer DEFAULT 0 NOT NULL,
	"title" text NOT NULL,
	"code" text NOT NULL,
	"edition" text NOT NULL,
	"status" text DEFAULT 'draft' NOT NULL,
	"unit" text DEFAULT 'in' NOT NULL,
	"process" text NOT NULL,
	"transfer" text,
	"p_number_a" text,
	"p_number_b" text,
	"thickness_min" double precision,
	"thickness_max" double precision,
	"diameter_min" double precision,
	"positions" text[] DEFAULT '{}'::text[] NOT NULL,
	"f_numbers" text[] DEFAULT '{}'::text[] NOT NULL,
	"variables" jsonb DEFAULT '{}'::jsonb NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" integer,
	"approved_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "procedures_status_check" CHECK ("procedures"."status" in ('draft', 'approved', 'superseded')),
	CONSTRAINT "procedures_code_check" CHECK ("procedures"."code" in ('asme-ix', 'aws-d1.1', 'aws-d1.3', 'iso-9606-1')),
	CONSTRAINT "procedures_revision_check" CHECK ("procedures"."revision" >= 0),
	CONSTRAINT "procedures_thickness_check" CHECK ("procedures"."thickness_min" is null or "procedures"."thickness_max" is null or "procedures"."thickness_min" <= "procedures"."thickness_max"),
	CONSTRAINT "procedures_unit_check" CHECK ("procedures"."unit" in ('in', 'mm'))
);
--> statement-breakpoint
CREATE TABLE "project_procedures" (
	"project_id" integer NOT NULL,
	"procedure_id" integer NOT NULL,
	CONSTRAINT "project_procedures_project_id_procedure_id_pk" PRIMARY KEY("project_id","procedure_id")
);
--> statement-breakpoint
CREATE TABLE "project_welders" (
	"project_id" integer NOT NULL,
	"welder_id" integer NOT NULL,
	CONSTRAINT "project_welders_project_id_welder_id_pk" PRIMARY KEY("project_id","welder_id")
);
--> statement-breakpoint
CREATE TABLE "projects" (
	"id" serial PRIMARY KEY NOT NULL,
	"customer_id" integer NOT NULL,
	"number" text NOT NULL,
	"name" text NOT NULL,
	"starts_on" date NOT NULL,
	"ends_on" date,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "projects_period_check" CHECK ("projects"."ends_on" is null or "projects"."ends_on" >= "projects"."starts_on")
);
--> statement-breakpoint
CREATE TABLE "readings" (
	"id" serial PRIMARY KEY NOT NULL,
	"procedure_id" integer NOT NULL,
	"welder_id" integer,
	"taken_at" timestamp with time zone DEFAULT now() NOT NULL,
	"values" jsonb NOT NULL,
	"out_of_window" boolean NOT NULL,
	"recorded_by" integer
);
--> statement-breakpoint
CREATE TABLE "signatures" (
	"id" serial PRIMARY KEY NOT NULL,
	"record_type" text NOT NULL,
	"record_id" integer NOT NULL,
	"record_version" integer NOT NULL,
	"signer_id" integer NOT NULL,
	"signer_name" text NOT NULL,
	"meaning" text NOT NULL,
	"signed_at" timestamp with time zone DEFAULT now() NOT NULL,
	"sha256" text NOT NULL,
	"verify_code" text NOT NULL,
	CONSTRAINT "signatures_meaning_check" CHECK ("signatures"."meaning" in ('prepared', 'witnessed', 'approved', 'certified')),
	CONSTRAINT "signatures_record_type_check" CHECK ("signatures"."record_type" in ('procedure', 'pqr', 'welder-test')),
	CONSTRAINT "signatures_sha_check" CHECK ("signatures"."sha256" ~ '^[0-9a-f]{64}$')
);
--> statement-breakpoint
CREATE TABLE "welder_test_bends" (
	"id" serial PRIMARY KEY NOT NULL,
	"test_id" integer NOT NULL,
	"type" text NOT NULL,
	"largest_indication" double precision DEFAULT 0 NOT NULL,
	"at_corner" boolean DEFAULT false NOT NULL,
	"accepted" boolean NOT NULL,
	CONSTRAINT "welder_test_bends_type_check" CHECK ("welder_test_bends"."type" in ('face', 'root', 'side')),
	CONSTRAINT "welder_test_bends_indication_check" CHECK ("welder_test_bends"."largest_indication" >= 0)
);
--> statement-breakpoint
CREATE TABLE "welder_tests" (
	"id" serial PRIMARY KEY NOT NULL,
	"welder_id" integer NOT NULL,
	"procedure_id" integer,
	"test_date" date NOT NULL,
	"code" text NOT NULL,
	"edition" text NOT NULL,
	"unit" text DEFAULT 'in' NOT NULL,
	"process" text NOT NULL,
	"transfer" text,
	"form" text NOT NULL,
	"weld" text NOT NULL,
	"coupon_thickness" double precision,
	"deposit_thickness" double precision,
	"layers" integer,
	"outside_diameter" double precision,
	"p_number" text,
	"f_number" text,
	"backing" boolean DEFAULT true NOT NULL,
	"positions" text[] NOT NULL,
	"progression" text,
	"visual_accepted" boolean,
	"visual_notes" text,
	"examination" text DEFAULT 'bend' NOT NULL,
	"radiography" jsonb,
	"ranges" jsonb,
	"status" text DEFAULT 'recorded' NOT NULL,
	"inspector_id" integer,
	"certified_at" timestamp with time zone,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "welder_tests_status_check" CHECK ("welder_tests"."status" in ('recorded', 'certified', 'failed')),
	CONSTRAINT "welder_tests_form_check" CHECK ("welder_tests"."form" in ('plate', 'pipe')),
	CONSTRAINT "welder_tests_weld_check" CHECK ("welder_tests"."weld" in ('groove', 'fillet')),
	CONSTRAINT "welder_tests_exam_check" CHECK ("welder_tests"."examination" in ('bend', 'radiography', 'macro-fracture')),
	CONSTRAINT "welder_tests_sizes_check" CHECK (coalesce("welder_tests"."coupon_thickness", 1) > 0 and coalesce("welder_tests"."outside_diameter", 1) > 0 and coalesce("welder_tests"."deposit_thickness", 1) > 0),
	CONSTRAINT "welder_tests_unit_check" CHECK ("welder_tests"."unit" in ('in', 'mm'))
);
--> statement-breakpoint
CREATE TABLE "welders" (
	"id" serial PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"stamp" text NOT NULL,
	"employee_number" text,
	"status" text DEFAULT 'active' NOT NULL,
	"email" text,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "welders_status_check" CHECK ("welders"."status" in ('active', 'inactive'))
);
--> statement-breakpoint
ALTER TABLE "accounts" ADD CONSTRAINT "accounts_welder_id_welders_id_fk" FOREIGN KEY ("welder_id") REFERENCES "public"."welders"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "attachments" ADD CONSTRAINT "attachments_uploaded_by_accounts_id_fk" FOREIGN KEY ("uploaded_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "audit_events" ADD CONSTRAINT "audit_events_account_id_accounts_id_fk" FOREIGN KEY ("account_id") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "auditor_grants" ADD CONSTRAINT "auditor_grants_account_id_accounts_id_fk" FOREIGN KEY ("account_id") REFERENCES "public"."accounts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "auditor_grants" ADD CONSTRAINT "auditor_grants_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "continuity_entries" ADD CONSTRAINT "continuity_entries_welder_id_welders_id_fk" FOREIGN KEY ("welder_id") REFERENCES "public"."welders"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "continuity_entries" ADD CONSTRAINT "continuity_entries_recorded_by_accounts_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "packets" ADD CONSTRAINT "packets_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "packets" ADD CONSTRAINT "packets_requested_by_accounts_id_fk" FOREIGN KEY ("requested_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pqr_bend_specimens" ADD CONSTRAINT "pqr_bend_specimens_pqr_id_pqrs_id_fk" FOREIGN KEY ("pqr_id") REFERENCES "public"."pqrs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pqr_tensile_specimens" ADD CONSTRAINT "pqr_tensile_specimens_pqr_id_pqrs_id_fk" FOREIGN KEY ("pqr_id") REFERENCES "public"."pqrs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pqrs" ADD CONSTRAINT "pqrs_base_metal_id_base_metals_id_fk" FOREIGN KEY ("base_metal_id") REFERENCES "public"."base_metals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "pqrs" ADD CONSTRAINT "pqrs_filler_metal_id_filler_metals_id_fk" FOREIGN KEY ("filler_metal_id") REFERENCES "public"."filler_metals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "procedure_pqrs" ADD CONSTRAINT "procedure_pqrs_procedure_id_procedures_id_fk" FOREIGN KEY ("procedure_id") REFERENCES "public"."procedures"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "procedure_pqrs" ADD CONSTRAINT "procedure_pqrs_pqr_id_pqrs_id_fk" FOREIGN KEY ("pqr_id") REFERENCES "public"."pqrs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "procedures" ADD CONSTRAINT "procedures_created_by_accounts_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_procedures" ADD CONSTRAINT "project_procedures_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_procedures" ADD CONSTRAINT "project_procedures_procedure_id_procedures_id_fk" FOREIGN KEY ("procedure_id") REFERENCES "public"."procedures"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_welders" ADD CONSTRAINT "project_welders_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "project_welders" ADD CONSTRAINT "project_welders_welder_id_welders_id_fk" FOREIGN KEY ("welder_id") REFERENCES "public"."welders"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "projects" ADD CONSTRAINT "projects_customer_id_customers_id_fk" FOREIGN KEY ("customer_id") REFERENCES "public"."customers"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "readings" ADD CONSTRAINT "readings_procedure_id_procedures_id_fk" FOREIGN KEY ("procedure_id") REFERENCES "public"."procedures"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "readings" ADD CONSTRAINT "readings_welder_id_welders_id_fk" FOREIGN KEY ("welder_id") REFERENCES "public"."welders"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "readings" ADD CONSTRAINT "readings_recorded_by_accounts_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signatures" ADD CONSTRAINT "signatures_signer_id_accounts_id_fk" FOREIGN KEY ("signer_id") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "welder_test_bends" ADD CONSTRAINT "welder_test_bends_test_id_welder_tests_id_fk" FOREIGN KEY ("test_id") REFERENCES "public"."welder_tests"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "welder_tests" ADD CONSTRAINT "welder_tests_welder_id_welders_id_fk" FOREIGN KEY ("welder_id") REFERENCES "public"."welders"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "welder_tests" ADD CONSTRAINT "welder_tests_procedure_id_procedures_id_fk" FOREIGN KEY ("procedure_id") REFERENCES "public"."procedures"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "welder_tests" ADD CONSTRAINT "welder_tests_inspector_id_accounts_id_fk" FOREIGN KEY ("inspector_id") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "accounts_email_key" ON "accounts" USING btree (lower("email"));--> statement-breakpoint
CREATE INDEX "attachments_record_idx" ON "attachments" USING btree ("record_type","record_id");--> statement-breakpoint
CREATE INDEX "audit_events_record_idx" ON "audit_events" USING btree ("record_type","record_id","at");--> statement-breakpoint
CREATE UNIQUE INDEX "base_metals_spec_grade_key" ON "base_metals" USING btree ("specification","grade");--> statement-breakpoint
CREATE INDEX "continuity_welder_process_idx" ON "continuity_entries" USING btree ("welder_id","process","welded_on");--> statement-breakpoint
CREATE INDEX "continuity_date_idx" ON "continuity_entries" USING btree ("welded_on");--> statement-breakpoint
CREATE UNIQUE INDEX "customers_name_key" ON "customers" USING btree ("name");--> statement-breakpoint
CREATE UNIQUE INDEX "filler_metals_spec_class_key" ON "filler_metals" USING btree ("specification","classification");--> statement-breakpoint
CREATE INDEX "pqr_bend_pqr_idx" ON "pqr_bend_specimens" USING btree ("pqr_id");--> statement-breakpoint
CREATE INDEX "pqr_tensile_pqr_idx" ON "pqr_tensile_specimens" USING btree ("pqr_id");--> statement-breakpoint
CREATE UNIQUE INDEX "pqrs_number_key" ON "pqrs" USING btree ("number");--> statement-breakpoint
CREATE UNIQUE INDEX "procedures_number_revision_key" ON "procedures" USING btree ("number","revision");--> statement-breakpoint
CREATE INDEX "procedures_status_idx" ON "procedures" USING btree ("status","process");--> statement-breakpoint
CREATE UNIQUE INDEX "projects_number_key" ON "projects" USING btree ("number");--> statement-breakpoint
CREATE INDEX "readings_procedure_idx" ON "readings" USING btree ("procedure_id","taken_at");--> statement-breakpoint
CREATE UNIQUE INDEX "signatures_verify_code_key" ON "signatures" USING btree ("verify_code");--> statement-breakpoint
CREATE INDEX "signatures_record_idx" ON "signatures" USING btree ("record_type","record_id");--> statement-breakpoint
CREATE INDEX "welder_test_bends_test_idx" ON "welder_test_bends" USING btree ("test_id");--> statement-breakpoint
CREATE INDEX "welder_tests_welder_idx" ON "welder_tests" USING btree ("welder_id","process");--> statement-breakpoint
CREATE INDEX "welder_tests_status_idx" ON "welder_tests" USING btree ("status","test_date");--> statement-breakpoint
CREATE UNIQUE INDEX "welders_stamp_key" ON "welders" USING btree ("stamp");--> statement-breakpoint
CREATE INDEX "welders_name_idx" ON "welders" USING btree ("name");