CREATE TABLE "method_design_revisions" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"design_id" uuid NOT NULL,
	"state" text NOT NULL,
	"method_version" integer,
	"definition" jsonb NOT NULL,
	"version" integer DEFAULT 1 NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_by" uuid,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	"released_by" uuid,
	"released_at" timestamp with time zone,
	"submitted_by" uuid,
	"submitted_at" timestamp with time zone,
	"reviewer_ids" uuid[] DEFAULT '{}'::uuid[] NOT NULL,
	"submit_note" text,
	"review_comment" text,
	"superseded_at" timestamp with time zone,
	"restored_from_version" integer,
	CONSTRAINT "method_design_revisions_version_unique" UNIQUE("design_id","method_version"),
	CONSTRAINT "method_design_revisions_state_check" CHECK ("method_design_revisions"."state" in ('draft', 'in_review', 'released', 'superseded')),
	CONSTRAINT "method_design_revisions_released_version_check" CHECK (("method_design_revisions"."state" in ('released', 'superseded')) = ("method_design_revisions"."method_version" is not null))
);
--> statement-breakpoint
CREATE TABLE "method_designs" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"slug" text NOT NULL,
	"owner_id" uuid,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	"updated_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "method_designs_slug_unique" UNIQUE("slug")
);
--> statement-breakpoint
ALTER TABLE "method_design_revisions" ADD CONSTRAINT "method_design_revisions_design_id_method_designs_id_fk" FOREIGN KEY ("design_id") REFERENCES "public"."method_designs"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "method_design_revisions" ADD CONSTRAINT "method_design_revisions_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "method_design_revisions" ADD CONSTRAINT "method_design_revisions_updated_by_users_id_fk" FOREIGN KEY ("updated_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "method_design_revisions" ADD CONSTRAINT "method_design_revisions_released_by_users_id_fk" FOREIGN KEY ("released_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "method_design_revisions" ADD CONSTRAINT "method_design_revisions_submitted_by_users_id_fk" FOREIGN KEY ("submitted_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "method_designs" ADD CONSTRAINT "method_designs_owner_id_users_id_fk" FOREIGN KEY ("owner_id") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "method_designs" ADD CONSTRAINT "method_designs_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "method_design_revisions_one_open_idx" ON "method_design_revisions" USING btree ("design_id") WHERE "method_design_revisions"."state" in ('draft', 'in_review');--> statement-breakpoint
CREATE INDEX "method_design_revisions_design_idx" ON "method_design_revisions" USING btree ("design_id");