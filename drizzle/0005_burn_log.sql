CREATE TABLE "burn_photos" (
	"id" text PRIMARY KEY NOT NULL,
	"burn_id" text NOT NULL,
	"owner_id" text NOT NULL,
	"image_key" text NOT NULL,
	"thumbnail_key" text NOT NULL,
	"content_type" text NOT NULL,
	"width" integer NOT NULL,
	"height" integer NOT NULL,
	"bytes" integer NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "burns" (
	"id" text PRIMARY KEY NOT NULL,
	"owner_id" text NOT NULL,
	"design_id" text NOT NULL,
	"version_id" text NOT NULL,
	"burned_at" timestamp with time zone NOT NULL,
	"fuel_kind" text,
	"fuel_mass_g" double precision,
	"starter" text,
	"ambient_c" double precision,
	"wind" text,
	"windscreen" boolean,
	"wind_facing" text,
	"time_to_light_s" double precision,
	"time_to_jets_s" double precision,
	"time_to_boil_s" double precision,
	"boil_water_l" double precision,
	"boil_start_c" double precision,
	"burn_time_s" double precision,
	"char_g" double precision,
	"smoke" text,
	"flame_ring" integer,
	"notes" text,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "burn_photos" ADD CONSTRAINT "burn_photos_burn_id_burns_id_fk" FOREIGN KEY ("burn_id") REFERENCES "public"."burns"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "burn_photos" ADD CONSTRAINT "burn_photos_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "burns" ADD CONSTRAINT "burns_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "burns" ADD CONSTRAINT "burns_design_id_designs_id_fk" FOREIGN KEY ("design_id") REFERENCES "public"."designs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "burns" ADD CONSTRAINT "burns_version_id_design_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."design_versions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "burn_photos_burn_id_idx" ON "burn_photos" USING btree ("burn_id");--> statement-breakpoint
CREATE INDEX "burns_design_id_idx" ON "burns" USING btree ("design_id");--> statement-breakpoint
CREATE INDEX "burns_owner_id_idx" ON "burns" USING btree ("owner_id");