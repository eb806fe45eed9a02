ALTER TABLE "procedures" ADD COLUMN "prequalified" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "welder_tests" ADD COLUMN "joint_type" text;