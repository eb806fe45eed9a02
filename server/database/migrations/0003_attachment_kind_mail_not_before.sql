ALTER TABLE "attachments" ADD COLUMN "kind" text DEFAULT 'other' NOT NULL;--> statement-breakpoint
ALTER TABLE "mail_messages" ADD COLUMN "not_before" timestamp with time zone;