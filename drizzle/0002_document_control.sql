CREATE TABLE "page_watches" (
	"page_id" uuid NOT NULL,
	"user_id" uuid NOT NULL,
	"created_at" timestamp with time zone DEFAULT now() NOT NULL,
	CONSTRAINT "page_watches_page_id_user_id_pk" PRIMARY KEY("page_id","user_id")
);
--> statement-breakpoint
ALTER TABLE "page_revisions" DROP CONSTRAINT "page_revisions_state_check";--> statement-breakpoint
DROP INDEX "page_revisions_one_draft_idx";--> statement-breakpoint
ALTER TABLE "pages" ADD COLUMN "obsolete_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "pages" ADD COLUMN "obsolete_by" uuid;--> statement-breakpoint
ALTER TABLE "pages" ADD COLUMN "obsolete_reason" text;--> statement-breakpoint
ALTER TABLE "page_revisions" ADD COLUMN "revision_letter" text;--> statement-breakpoint
ALTER TABLE "page_revisions" ADD COLUMN "submitted_by" uuid;--> statement-breakpoint
ALTER TABLE "page_revisions" ADD COLUMN "submitted_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "page_revisions" ADD COLUMN "reviewer_ids" uuid[] DEFAULT '{}'::uuid[] NOT NULL;--> statement-breakpoint
ALTER TABLE "page_revisions" ADD COLUMN "submit_note" text;--> statement-breakpoint
ALTER TABLE "page_revisions" ADD COLUMN "review_comment" text;--> statement-breakpoint
ALTER TABLE "page_revisions" ADD COLUMN "superseded_at" timestamp with time zone;--> statement-breakpoint
ALTER TABLE "page_revisions" ADD COLUMN "restored_from_id" uuid;--> statement-breakpoint
-- Hand-written data change: published revisions become released (the page's current one) or
-- superseded (earlier ones), lettered in order of publication with the letters of ASME Y14.35
-- (no I, O, Q, S, X, Z). Pages with more than 20 publications keep later letters empty.
UPDATE "page_revisions" AS r SET
	"state" = CASE WHEN p."current_published_revision_id" = r."id" THEN 'released' ELSE 'superseded' END,
	"revision_letter" = (ARRAY['A','B','C','D','E','F','G','H','J','K','L','M','N','P','R','T','U','V','W','Y'])[n."rank"],
	"superseded_at" = CASE WHEN p."current_published_revision_id" = r."id" THEN NULL ELSE r."updated_at" END
FROM "pages" AS p, (
	SELECT "id", row_number() OVER (PARTITION BY "page_id" ORDER BY "published_at", "sequence") AS "rank"
	FROM "page_revisions" WHERE "state" = 'published'
) AS n
WHERE r."state" = 'published' AND p."id" = r."page_id" AND n."id" = r."id";--> statement-breakpoint
ALTER TABLE "page_watches" ADD CONSTRAINT "page_watches_page_id_pages_id_fk" FOREIGN KEY ("page_id") REFERENCES "public"."pages"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "page_watches" ADD CONSTRAINT "page_watches_user_id_users_id_fk" FOREIGN KEY ("user_id") REFERENCES "public"."users"("id") ON DELETE cascade ON UPDATE no action;--> statement-breakpoint
CREATE INDEX "page_watches_user_idx" ON "page_watches" USING btree ("user_id");--> statement-breakpoint
ALTER TABLE "pages" ADD CONSTRAINT "pages_obsolete_by_users_id_fk" FOREIGN KEY ("obsolete_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
ALTER TABLE "page_revisions" ADD CONSTRAINT "page_revisions_submitted_by_users_id_fk" FOREIGN KEY ("submitted_by") REFERENCES "public"."users"("id") ON DELETE set null ON UPDATE no action;--> statement-breakpoint
CREATE UNIQUE INDEX "page_revisions_one_draft_idx" ON "page_revisions" USING btree ("page_id") WHERE "page_revisions"."state" in ('draft', 'in_review');--> statement-breakpoint
ALTER TABLE "page_revisions" ADD CONSTRAINT "page_revisions_page_letter_unique" UNIQUE("page_id","revision_letter");--> statement-breakpoint
ALTER TABLE "page_revisions" ADD CONSTRAINT "page_revisions_state_check" CHECK ("page_revisions"."state" in ('draft', 'in_review', 'released', 'superseded'));