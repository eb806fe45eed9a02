CREATE TABLE "trial_beads" (
	"id" serial PRIMARY KEY NOT NULL,
	"series_id" integer NOT NULL,
	"number" integer NOT NULL,
	"volts" double precision NOT NULL,
	"wire_feed" double precision NOT NULL,
	"amps" double precision,
	"ctwd" double precision,
	"travel_speed" double precision,
	"bead_length" double precision,
	"arc_time" double precision,
	"energy" double precision,
	"power" double precision,
	"gas_flow" double precision,
	"wetting" text,
	"spatter" text,
	"arc_sound" text,
	"porosity" boolean DEFAULT false NOT NULL,
	"undercut" boolean DEFAULT false NOT NULL,
	"melt_through" boolean DEFAULT false NOT NULL,
	"lack_of_fusion" boolean DEFAULT false NOT NULL,
	"back_penetration" text,
	"notes" text,
	"recorded_by" integer,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "trial_beads_settings_check" CHECK ("trial_beads"."volts" > 0 and "trial_beads"."wire_feed" > 0)
);
--> statement-breakpoint
CREATE TABLE "trial_series" (
	"id" serial PRIMARY KEY NOT NULL,
	"title" text NOT NULL,
	"unit" text DEFAULT 'in' NOT NULL,
	"process" text NOT NULL,
	"transfer" text,
	"wire_class" text NOT NULL,
	"wire_diameter" double precision NOT NULL,
	"filler_metal_id" integer,
	"gas" text,
	"gas_flow" double precision,
	"base_metal" text NOT NULL,
	"base_metal_id" integer,
	"thickness" double precision NOT NULL,
	"gauge" text,
	"joint" text NOT NULL,
	"root_gap" double precision,
	"position" text NOT NULL,
	"progression" text,
	"notes" text,
	"pqr_id" integer,
	"procedure_id" integer,
	"created_by" integer,
	"version" integer DEFAULT 1 NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "trial_series_sizes_check" CHECK ("trial_series"."wire_diameter" > 0 and "trial_series"."thickness" > 0),
	CONSTRAINT "trial_series_unit_check" CHECK ("trial_series"."unit" in ('in', 'mm'))
);
--> statement-breakpoint
CREATE TABLE "trial_starting_points" (
	"id" serial PRIMARY KEY NOT NULL,
	"unit" text DEFAULT 'in' NOT NULL,
	"process" text NOT NULL,
	"transfer" text,
	"wire_diameter" double precision NOT NULL,
	"thickness" double precision NOT NULL,
	"gauge" text,
	"gas" text,
	"volts" double precision NOT NULL,
	"wire_feed" double precision NOT NULL,
	"amps" double precision,
	"ctwd" double precision,
	"travel_speed" double precision,
	"source" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "trial_starting_points_unit_check" CHECK ("trial_starting_points"."unit" in ('in', 'mm'))
);
--> statement-breakpoint
ALTER TABLE "shop_settings" ADD COLUMN "welder_records_trials" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "trial_beads" ADD CONSTRAINT "trial_beads_series_id_trial_series_id_fk" FOREIGN KEY ("series_id") REFERENCES "public"."trial_series"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trial_beads" ADD CONSTRAINT "trial_beads_recorded_by_accounts_id_fk" FOREIGN KEY ("recorded_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trial_series" ADD CONSTRAINT "trial_series_filler_metal_id_filler_metals_id_fk" FOREIGN KEY ("filler_metal_id") REFERENCES "public"."filler_metals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trial_series" ADD CONSTRAINT "trial_series_base_metal_id_base_metals_id_fk" FOREIGN KEY ("base_metal_id") REFERENCES "public"."base_metals"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trial_series" ADD CONSTRAINT "trial_series_pqr_id_pqrs_id_fk" FOREIGN KEY ("pqr_id") REFERENCES "public"."pqrs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trial_series" ADD CONSTRAINT "trial_series_procedure_id_procedures_id_fk" FOREIGN KEY ("procedure_id") REFERENCES "public"."procedures"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "trial_series" ADD CONSTRAINT "trial_series_created_by_accounts_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "trial_beads_series_number_key" ON "trial_beads" USING btree ("series_id","number");--> statement-breakpoint
CREATE INDEX "trial_series_updated_idx" ON "trial_series" USING btree ("updated_at");--> statement-breakpoint
CREATE INDEX "trial_starting_points_process_idx" ON "trial_starting_points" USING btree ("process");