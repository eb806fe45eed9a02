CREATE TABLE "sign_in_failures" (
	"key" text PRIMARY KEY NOT NULL,
	"failures" integer DEFAULT 0 NOT NULL,
	"last_failure_at" timestamp with time zone DEFAULT now() NOT NULL,
	"locked_until" timestamp with time zone,
	CONSTRAINT "sign_in_failures_count_check" CHECK ("sign_in_failures"."failures" >= 0)
);
--> statement-breakpoint
ALTER TABLE "accounts" ADD COLUMN "session_generation" integer DEFAULT 0 NOT NULL;--> statement-breakpoint
CREATE INDEX "sign_in_failures_last_idx" ON "sign_in_failures" USING btree ("last_failure_at");