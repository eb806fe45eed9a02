ALTER TABLE "welders" ADD COLUMN "calendar_token" text;--> statement-breakpoint
CREATE UNIQUE INDEX "welders_calendar_token_key" ON "welders" USING btree ("calendar_token");