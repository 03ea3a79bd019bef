CREATE TYPE "public"."probe_status" AS ENUM('ready', 'searching', 'done', 'failed');--> statement-breakpoint
CREATE TABLE "probes" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" uuid NOT NULL,
	"group_id" uuid,
	"title" text NOT NULL,
	"file_name" text NOT NULL,
	"format" text NOT NULL,
	"n" integer NOT NULL,
	"matrix" "bytea" NOT NULL,
	"input" "bytea",
	"mu" double precision NOT NULL,
	"nonlinearity" text DEFAULT 'tanh' NOT NULL,
	"stats" jsonb NOT NULL,
	"spectrum" jsonb NOT NULL,
	"status" "probe_status" DEFAULT 'ready' NOT NULL,
	"failure" text,
	"search" jsonb,
	"result" jsonb,
	"comparison" jsonb,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "users" ADD COLUMN "notify_map_finished" boolean DEFAULT false NOT NULL;--> statement-breakpoint
ALTER TABLE "probes" ADD CONSTRAINT "probes_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "probes" ADD CONSTRAINT "probes_group_id_groups_id_fk" FOREIGN KEY ("group_id") REFERENCES "public"."groups"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "probes_owner_idx" ON "probes" USING btree ("owner_id");