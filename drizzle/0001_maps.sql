CREATE TYPE "public"."map_cell_state" AS ENUM('pending', 'done', 'failed', 'cancelled');--> statement-breakpoint
CREATE TYPE "public"."map_status" AS ENUM('queued', 'running', 'done', 'cancelled', 'failed');--> statement-breakpoint
CREATE TYPE "public"."map_visibility" AS ENUM('private', 'group', 'link');--> statement-breakpoint
CREATE TABLE "cells" (
	"key" text PRIMARY KEY NOT NULL,
	"ensemble" text NOT NULL,
	"ensemble_version" text NOT NULL,
	"input" jsonb NOT NULL,
	"result" jsonb NOT NULL,
	"compute_seconds" double precision NOT NULL,
	"worker" text NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "map_cells" (
	"map_id" uuid NOT NULL,
	"i" integer NOT NULL,
	"j" integer NOT NULL,
	"mu" double precision NOT NULL,
	"tau" double precision NOT NULL,
	"cell_key" text NOT NULL,
	"theory_key" text NOT NULL,
	"state" "map_cell_state" DEFAULT 'pending' NOT NULL,
	"from_cache" boolean DEFAULT false NOT NULL,
	"job_id" uuid,
	"failure" text,
	"done_at" timestamp with time zone,
	CONSTRAINT "map_cells_map_id_i_j_pk" PRIMARY KEY("map_id","i","j")
);
--> statement-breakpoint
CREATE TABLE "maps" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"owner_id" uuid NOT NULL,
	"group_id" uuid,
	"title" text NOT NULL,
	"description" text DEFAULT '' NOT NULL,
	"visibility" "map_visibility" DEFAULT 'private' NOT NULL,
	"share_token" text,
	"ensemble" text NOT NULL,
	"ensemble_version" text NOT NULL,
	"settings" jsonb NOT NULL,
	"mu_axis" jsonb NOT NULL,
	"tau_axis" jsonb NOT NULL,
	"budget" jsonb NOT NULL,
	"seed" integer NOT NULL,
	"status" "map_status" DEFAULT 'queued' NOT NULL,
	"failure" text,
	"cells_total" integer NOT NULL,
	"cells_done" integer DEFAULT 0 NOT NULL,
	"cells_computed" integer DEFAULT 0 NOT NULL,
	"cells_from_cache" integer DEFAULT 0 NOT NULL,
	"replicate_of" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"started_at" timestamp with time zone,
	"finished_at" timestamp with time zone,
	CONSTRAINT "maps_share_token_unique" UNIQUE("share_token")
);
--> statement-breakpoint
CREATE TABLE "theory_rows" (
	"key" text PRIMARY KEY NOT NULL,
	"ensemble" text NOT NULL,
	"tau" double precision NOT NULL,
	"mus" jsonb NOT NULL,
	"columns" jsonb NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "map_cells" ADD CONSTRAINT "map_cells_map_id_maps_id_fk" FOREIGN KEY ("map_id") REFERENCES "public"."maps"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "maps" ADD CONSTRAINT "maps_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "maps" ADD CONSTRAINT "maps_group_id_groups_id_fk" FOREIGN KEY ("group_id") REFERENCES "public"."groups"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "map_cells_key_idx" ON "map_cells" USING btree ("cell_key");--> statement-breakpoint
CREATE INDEX "map_cells_pending_idx" ON "map_cells" USING btree ("map_id") WHERE state = 'pending';--> statement-breakpoint
CREATE INDEX "maps_owner_idx" ON "maps" USING btree ("owner_id");--> statement-breakpoint
CREATE INDEX "maps_group_idx" ON "maps" USING btree ("group_id");