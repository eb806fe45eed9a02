CREATE TABLE "process_standings" (
	"welder_id" integer NOT NULL,
	"process" text NOT NULL,
	"code" text NOT NULL,
	"edition" text NOT NULL,
	"test_date" date NOT NULL,
	"last_use" date NOT NULL,
	"lapses_on" date NOT NULL,
	"rule" text NOT NULL,
	CONSTRAINT "process_standings_welder_id_process_pk" PRIMARY KEY("welder_id","process")
);
--> statement-breakpoint
CREATE TABLE "standing_refresh" (
	"welder_id" integer NOT NULL,
	"process" text NOT NULL,
	CONSTRAINT "standing_refresh_welder_id_process_pk" PRIMARY KEY("welder_id","process")
);
--> statement-breakpoint
ALTER TABLE "process_standings" ADD CONSTRAINT "process_standings_welder_id_welders_id_fk" FOREIGN KEY ("welder_id") REFERENCES "public"."welders"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "process_standings_lapses_idx" ON "process_standings" USING btree ("lapses_on");