ALTER TABLE "users" ADD COLUMN "default_paper" text DEFAULT 'letter' NOT NULL;--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "drill_set_ids" text[] DEFAULT '{}'::text[] NOT NULL;