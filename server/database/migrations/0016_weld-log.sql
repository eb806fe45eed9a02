CREATE TABLE "api_tokens" (
	"id" serial PRIMARY KEY NOT NULL,
	"name" text NOT NULL,
	"token_hash" text NOT NULL,
	"prefix" text NOT NULL,
	"scopes" text[] NOT NULL,
	"created_by" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"revoked_at" timestamp with time zone,
	"last_used_at" timestamp with time zone,
	"window_start" timestamp with time zone DEFAULT now() NOT NULL,
	"window_count" integer DEFAULT 0 NOT NULL
);
--> statement-breakpoint
CREATE TABLE "issued_registers" (
	"id" serial PRIMARY KEY NOT NULL,
	"project_id" integer NOT NULL,
	"sha256" text NOT NULL,
	"verify_code" text NOT NULL,
	"issued_by" integer,
	"issuer_name" text NOT NULL,
	"issued_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "issued_registers_sha_check" CHECK ("issued_registers"."sha256" ~ '^[0-9a-f]{64}$')
);
--> statement-breakpoint
CREATE TABLE "joint_examinations" (
	"id" serial PRIMARY KEY NOT NULL,
	"joint_id" integer NOT NULL,
	"repair" integer DEFAULT 0 NOT NULL,
	"method" text NOT NULL,
	"report_number" text,
	"examined_on" date NOT NULL,
	"accepted" boolean NOT NULL,
	"length_examined" double precision,
	"defect_type" text,
	"defect_length" double precision,
	"recorded_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "joint_examinations_method_check" CHECK ("joint_examinations"."method" in ('VT', 'RT', 'UT', 'MT', 'PT')),
	CONSTRAINT "joint_examinations_lengths_check" CHECK (coalesce("joint_examinations"."length_examined", 1) > 0 and coalesce("joint_examinations"."defect_length", 0) >= 0)
);
--> statement-breakpoint
CREATE TABLE "joint_overrides" (
	"id" serial PRIMARY KEY NOT NULL,
	"joint_id" integer NOT NULL,
	"stage" text NOT NULL,
	"reason" text NOT NULL,
	"refusals" jsonb DEFAULT '[]'::jsonb NOT NULL,
	"account_id" integer NOT NULL,
	"account_name" text NOT NULL,
	"at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "joint_overrides_stage_check" CHECK ("joint_overrides"."stage" in ('assignment', 'completion', 'repair'))
);
--> statement-breakpoint
CREATE TABLE "joint_repairs" (
	"id" serial PRIMARY KEY NOT NULL,
	"joint_id" integer NOT NULL,
	"repair" integer NOT NULL,
	"cause" text NOT NULL,
	"welded_on" date,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "joint_repairs_repair_check" CHECK ("joint_repairs"."repair" between 1 and 9)
);
--> statement-breakpoint
CREATE TABLE "joint_welders" (
	"id" serial PRIMARY KEY NOT NULL,
	"joint_id" integer NOT NULL,
	"welder_id" integer NOT NULL,
	"process" text NOT NULL,
	"layer" text,
	"f_number" integer,
	"repair" integer DEFAULT 0 NOT NULL,
	CONSTRAINT "joint_welders_repair_check" CHECK ("joint_welders"."repair" between 0 and 9)
);
--> statement-breakpoint
CREATE TABLE "joints" (
	"id" serial PRIMARY KEY NOT NULL,
	"project_id" integer NOT NULL,
	"mark" text NOT NULL,
	"joint_type" text NOT NULL,
	"weld" text DEFAULT 'groove' NOT NULL,
	"unit" text DEFAULT 'in' NOT NULL,
	"p_number_a" text,
	"p_number_b" text,
	"thickness" double precision,
	"outside_diameter" double precision,
	"positions" text[] DEFAULT '{}'::text[] NOT NULL,
	"progression" text,
	"backing" boolean,
	"rt_percent" integer DEFAULT 0 NOT NULL,
	"ut_percent" integer DEFAULT 0 NOT NULL,
	"mt" boolean DEFAULT false NOT NULL,
	"pt" boolean DEFAULT false NOT NULL,
	"procedure_id" integer,
	"welded_on" date,
	"completion_check" jsonb,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "joints_weld_check" CHECK ("joints"."weld" in ('groove', 'fillet')),
	CONSTRAINT "joints_percent_check" CHECK ("joints"."rt_percent" between 0 and 100 and "joints"."ut_percent" between 0 and 100),
	CONSTRAINT "joints_sizes_check" CHECK (coalesce("joints"."thickness", 1) > 0 and coalesce("joints"."outside_diameter", 1) > 0),
	CONSTRAINT "joints_unit_check" CHECK ("joints"."unit" in ('in', 'mm'))
);
--> statement-breakpoint
ALTER TABLE "continuity_entries" ADD COLUMN "joint_id" integer;--> statement-breakpoint
ALTER TABLE "api_tokens" ADD CONSTRAINT "api_tokens_created_by_accounts_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "issued_registers" ADD CONSTRAINT "issued_registers_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "issued_registers" ADD CONSTRAINT "issued_registers_issued_by_accounts_id_fk" FOREIGN KEY ("issued_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joint_examinations" ADD CONSTRAINT "joint_examinations_joint_id_joints_id_fk" FOREIGN KEY ("joint_id") REFERENCES "public"."joints"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joint_examinations" ADD CONSTRAINT "joint_examinations_recorded_by_accounts_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joint_overrides" ADD CONSTRAINT "joint_overrides_joint_id_joints_id_fk" FOREIGN KEY ("joint_id") REFERENCES "public"."joints"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joint_overrides" ADD CONSTRAINT "joint_overrides_account_id_accounts_id_fk" FOREIGN KEY ("account_id") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joint_repairs" ADD CONSTRAINT "joint_repairs_joint_id_joints_id_fk" FOREIGN KEY ("joint_id") REFERENCES "public"."joints"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joint_welders" ADD CONSTRAINT "joint_welders_joint_id_joints_id_fk" FOREIGN KEY ("joint_id") REFERENCES "public"."joints"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joint_welders" ADD CONSTRAINT "joint_welders_welder_id_welders_id_fk" FOREIGN KEY ("welder_id") REFERENCES "public"."welders"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joints" ADD CONSTRAINT "joints_project_id_projects_id_fk" FOREIGN KEY ("project_id") REFERENCES "public"."projects"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joints" ADD CONSTRAINT "joints_procedure_id_procedures_id_fk" FOREIGN KEY ("procedure_id") REFERENCES "public"."procedures"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "joints" ADD CONSTRAINT "joints_created_by_accounts_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "api_tokens_hash_key" ON "api_tokens" USING btree ("token_hash");--> statement-breakpoint
CREATE UNIQUE INDEX "issued_registers_verify_code_key" ON "issued_registers" USING btree ("verify_code");--> statement-breakpoint
CREATE INDEX "issued_registers_project_idx" ON "issued_registers" USING btree ("project_id","sha256");--> statement-breakpoint
CREATE INDEX "joint_examinations_joint_idx" ON "joint_examinations" USING btree ("joint_id","examined_on");--> statement-breakpoint
CREATE INDEX "joint_overrides_joint_idx" ON "joint_overrides" USING btree ("joint_id");--> statement-breakpoint
CREATE UNIQUE INDEX "joint_repairs_key" ON "joint_repairs" USING btree ("joint_id","repair");--> statement-breakpoint
CREATE INDEX "joint_welders_joint_idx" ON "joint_welders" USING btree ("joint_id","repair");--> statement-breakpoint
CREATE INDEX "joint_welders_welder_idx" ON "joint_welders" USING btree ("welder_id");--> statement-breakpoint
CREATE UNIQUE INDEX "joints_project_mark_key" ON "joints" USING btree ("project_id","mark");--> statement-breakpoint
CREATE INDEX "joints_project_welded_idx" ON "joints" USING btree ("project_id","welded_on");--> statement-breakpoint
CREATE INDEX "joints_procedure_idx" ON "joints" USING btree ("procedure_id");--> statement-breakpoint
ALTER TABLE "continuity_entries" ADD CONSTRAINT "continuity_entries_joint_id_joints_id_fk" FOREIGN KEY ("joint_id") REFERENCES "public"."joints"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "continuity_joint_idx" ON "continuity_entries" USING btree ("joint_id");