ALTER TABLE "users" ADD COLUMN "mass_unit" text;--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "temperature_unit" text;--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "volume_unit" text;