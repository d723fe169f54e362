CREATE TABLE "workshop_invitations" (
	"id" text PRIMARY KEY NOT NULL,
	"workshop_id" text NOT NULL,
	"email" text NOT NULL,
	"token_hash" text NOT NULL,
	"expires_at" timestamp with time zone NOT NULL,
	"sent_at" timestamp with time zone DEFAULT now() NOT NULL,
	"accepted_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "workshop_invitations_token_hash_unique" UNIQUE("token_hash"),
	CONSTRAINT "workshop_invitations_workshop_email_unique" UNIQUE("workshop_id","email")
);
--> statement-breakpoint
CREATE TABLE "workshop_members" (
	"workshop_id" text NOT NULL,
	"user_id" text NOT NULL,
	"joined_at" timestamp with time zone DEFAULT now() NOT NULL,
	"printed_at" timestamp with time zone,
	CONSTRAINT "workshop_members_workshop_id_user_id_pk" PRIMARY KEY("workshop_id","user_id")
);
--> statement-breakpoint
CREATE TABLE "workshops" (
	"id" text PRIMARY KEY NOT NULL,
	"owner_id" text NOT NULL,
	"title" text NOT NULL,
	"starts_at" timestamp with time zone NOT NULL,
	"place" text DEFAULT '' NOT NULL,
	"notes" text DEFAULT '' NOT NULL,
	"capacity" integer NOT NULL,
	"default_paper" text DEFAULT 'letter' NOT NULL,
	"design_id" text NOT NULL,
	"version_id" text NOT NULL,
	"join_code" text,
	"kit_moved_at" timestamp with time zone,
	"closed_at" timestamp with time zone,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "workshops_join_code_unique" UNIQUE("join_code")
);
--> statement-breakpoint
ALTER TABLE "burns" ADD COLUMN "workshop_id" text;--> statement-breakpoint
ALTER TABLE "workshop_invitations" ADD CONSTRAINT "workshop_invitations_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "workshop_members" ADD CONSTRAINT "workshop_members_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "workshop_members" ADD CONSTRAINT "workshop_members_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "workshops" ADD CONSTRAINT "workshops_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "workshops" ADD CONSTRAINT "workshops_design_id_designs_id_fk" FOREIGN KEY ("design_id") REFERENCES "public"."designs"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "workshops" ADD CONSTRAINT "workshops_version_id_design_versions_id_fk" FOREIGN KEY ("version_id") REFERENCES "public"."design_versions"("id") ON DELETE no action ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "workshop_members_user_id_idx" ON "workshop_members" USING btree ("user_id");--> statement-breakpoint
CREATE INDEX "workshops_owner_id_idx" ON "workshops" USING btree ("owner_id");--> statement-breakpoint
CREATE INDEX "workshops_design_id_idx" ON "workshops" USING btree ("design_id");--> statement-breakpoint
ALTER TABLE "burns" ADD CONSTRAINT "burns_workshop_id_workshops_id_fk" FOREIGN KEY ("workshop_id") REFERENCES "public"."workshops"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "burns_workshop_id_idx" ON "burns" USING btree ("workshop_id");