CREATE TABLE "issued_sheets" (
	"id" serial PRIMARY KEY NOT NULL,
	"kind" text NOT NULL,
	"welder_id" integer NOT NULL,
	"period_from" date NOT NULL,
	"period_to" date NOT NULL,
	"sha256" text NOT NULL,
	"verify_code" text NOT NULL,
	"issued_by" integer,
	"issuer_name" text NOT NULL,
	"issued_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "issued_sheets_kind_check" CHECK ("issued_sheets"."kind" in ('continuity-log')),
	CONSTRAINT "issued_sheets_sha_check" CHECK ("issued_sheets"."sha256" ~ '^[0-9a-f]{64}$')
);
--> statement-breakpoint
CREATE TABLE "packet_files" (
	"packet_id" integer PRIMARY KEY NOT NULL,
	"content" "bytea" NOT NULL
);
--> statement-breakpoint
ALTER TABLE "packets" ADD COLUMN "updated_at" timestamp with time zone DEFAULT now() NOT NULL;--> statement-breakpoint
ALTER TABLE "issued_sheets" ADD CONSTRAINT "issued_sheets_welder_id_welders_id_fk" FOREIGN KEY ("welder_id") REFERENCES "public"."welders"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "issued_sheets" ADD CONSTRAINT "issued_sheets_issued_by_accounts_id_fk" FOREIGN KEY ("issued_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "packet_files" ADD CONSTRAINT "packet_files_packet_id_packets_id_fk" FOREIGN KEY ("packet_id") REFERENCES "public"."packets"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "issued_sheets_verify_code_key" ON "issued_sheets" USING btree ("verify_code");--> statement-breakpoint
CREATE INDEX "issued_sheets_subject_idx" ON "issued_sheets" USING btree ("kind","welder_id","period_from","period_to","sha256");