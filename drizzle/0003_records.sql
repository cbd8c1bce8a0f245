CREATE TABLE "calculation_records" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"page_id" uuid NOT NULL,
	"revision_id" uuid NOT NULL,
	"block_id" uuid NOT NULL,
	"method_id" text NOT NULL,
	"method_version" integer NOT NULL,
	"unit" text NOT NULL,
	"inputs" jsonb NOT NULL,
	"outputs" jsonb NOT NULL,
	"verdict" jsonb,
	"steps" jsonb NOT NULL,
	"warnings" text[] NOT NULL,
	"acceptance" jsonb,
	"reference" jsonb NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
CREATE TABLE "impact_reports" (
	"id" uuid PRIMARY KEY DEFAULT gen_random_uuid() NOT NULL,
	"page_id" uuid NOT NULL,
	"from_revision_id" uuid NOT NULL,
	"to_revision_id" uuid NOT NULL,
	"changed_blocks" jsonb NOT NULL,
	"records_checked" integer NOT NULL,
	"affected" jsonb NOT NULL,
	"created_by" uuid,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL
);
--> statement-breakpoint
ALTER TABLE "calculation_records" ADD CONSTRAINT "calculation_records_page_id_pages_id_fk" FOREIGN KEY ("page_id") REFERENCES "public"."pages"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calculation_records" ADD CONSTRAINT "calculation_records_revision_id_page_revisions_id_fk" FOREIGN KEY ("revision_id") REFERENCES "public"."page_revisions"("id") ON DELETE restrict ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "calculation_records" ADD CONSTRAINT "calculation_records_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "impact_reports" ADD CONSTRAINT "impact_reports_page_id_pages_id_fk" FOREIGN KEY ("page_id") REFERENCES "public"."pages"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "impact_reports" ADD CONSTRAINT "impact_reports_from_revision_id_page_revisions_id_fk" FOREIGN KEY ("from_revision_id") REFERENCES "public"."page_revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "impact_reports" ADD CONSTRAINT "impact_reports_to_revision_id_page_revisions_id_fk" FOREIGN KEY ("to_revision_id") REFERENCES "public"."page_revisions"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "impact_reports" ADD CONSTRAINT "impact_reports_created_by_users_id_fk" FOREIGN KEY ("created_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "calculation_records_creator_idx" ON "calculation_records" USING btree ("created_by","created_at");--> statement-breakpoint
CREATE INDEX "calculation_records_revision_block_idx" ON "calculation_records" USING btree ("revision_id","block_id");--> statement-breakpoint
CREATE INDEX "calculation_records_page_idx" ON "calculation_records" USING btree ("page_id");--> statement-breakpoint
CREATE INDEX "calculation_records_created_idx" ON "calculation_records" USING btree ("created_at");--> statement-breakpoint
CREATE INDEX "impact_reports_page_idx" ON "impact_reports" USING btree ("page_id","created_at");