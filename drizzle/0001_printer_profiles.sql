CREATE TABLE "printer_profiles" (
	"id" text PRIMARY KEY NOT NULL,
	"user_id" text NOT NULL,
	"name" text NOT NULL,
	"measured_x_mm" double precision NOT NULL,
	"measured_y_mm" double precision NOT NULL,
	"is_default" boolean DEFAULT false NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "printer_profiles" ADD CONSTRAINT "printer_profiles_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "printer_profiles_user_id_idx" ON "printer_profiles" USING btree ("user_id");--> statement-breakpoint
CREATE UNIQUE INDEX "printer_profiles_one_default_idx" ON "printer_profiles" USING btree ("user_id") WHERE "printer_profiles"."is_default";