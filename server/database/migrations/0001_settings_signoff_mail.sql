CREATE TABLE "account_tokens" (
	"id" serial PRIMARY KEY NOT NULL,
	"account_id" integer NOT NULL,
	"purpose" text NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"used_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "account_tokens_purpose_check" CHECK ("account_tokens"."purpose" in ('invitation', 'password-reset'))
);
--> statement-breakpoint
CREATE TABLE "mail_messages" (
	"id" serial PRIMARY KEY NOT NULL,
	"dedupe_key" text NOT NULL,
	"kind" text NOT NULL,
	"to" text NOT NULL,
	"subject" text NOT NULL,
	"text" text NOT NULL,
	"html" text NOT NULL,
	"status" text DEFAULT 'queued' NOT NULL,
	"attempts" integer DEFAULT 0 NOT NULL,
	"last_error" text,
	"sent_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "mail_messages_status_check" CHECK ("mail_messages"."status" in ('queued', 'sent', 'failed'))
);
--> statement-breakpoint
CREATE TABLE "shop_settings" (
	"id" integer PRIMARY KEY DEFAULT 1 NOT NULL,
	"name" text NOT NULL,
	"welder_logs_own_continuity" boolean DEFAULT false NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "shop_settings_single_row_check" CHECK ("shop_settings"."id" = 1)
);
--> statement-breakpoint
CREATE TABLE "signoff_requests" (
	"id" serial PRIMARY KEY NOT NULL,
	"record_type" text NOT NULL,
	"record_id" integer NOT NULL,
	"meaning" text NOT NULL,
	"requested_by" integer NOT NULL,
	"requested_of" integer,
	"note" text,
	"status" text DEFAULT 'open' NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"resolved_at" timestamp with time zone,
	CONSTRAINT "signoff_requests_status_check" CHECK ("signoff_requests"."status" in ('open', 'done', 'withdrawn')),
	CONSTRAINT "signoff_requests_meaning_check" CHECK ("signoff_requests"."meaning" in ('approved', 'certified', 'witnessed'))
);
--> statement-breakpoint
ALTER TABLE "account_tokens" ADD CONSTRAINT "account_tokens_account_id_accounts_id_fk" FOREIGN KEY ("account_id") REFERENCES "public"."accounts"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signoff_requests" ADD CONSTRAINT "signoff_requests_requested_by_accounts_id_fk" FOREIGN KEY ("requested_by") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "signoff_requests" ADD CONSTRAINT "signoff_requests_requested_of_accounts_id_fk" FOREIGN KEY ("requested_of") REFERENCES "public"."accounts"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "account_tokens_hash_key" ON "account_tokens" USING btree ("token_hash");--> statement-breakpoint
CREATE UNIQUE INDEX "mail_messages_dedupe_key" ON "mail_messages" USING btree ("dedupe_key");--> statement-breakpoint
CREATE INDEX "mail_messages_status_idx" ON "mail_messages" USING btree ("status","created_at");--> statement-breakpoint
CREATE INDEX "signoff_requests_open_idx" ON "signoff_requests" USING btree ("status","requested_of");