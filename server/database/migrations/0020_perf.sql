CREATE TABLE "qualified_coupons" (
	"input_key" text PRIMARY KEY NOT NULL,
	"code" text NOT NULL,
	"edition" text NOT NULL,
	"unit" text DEFAULT 'in' NOT NULL,
	"input" jsonb NOT NULL
);
--> statement-breakpoint
ALTER TABLE "qualified_ranges" ADD COLUMN "input_key" text;--> statement-breakpoint
ALTER TABLE "qualified_ranges" ADD COLUMN "test_date" date;--> statement-breakpoint
ALTER TABLE "qualified_ranges" ADD COLUMN "qualified_as" text;