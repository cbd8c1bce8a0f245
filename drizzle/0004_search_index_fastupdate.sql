DROP INDEX "page_revisions_search_idx";--> statement-breakpoint
CREATE INDEX "page_revisions_search_idx" ON "page_revisions" USING gin ("search_vector") WITH (fastupdate=false);