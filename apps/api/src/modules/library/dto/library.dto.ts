import {
  type Collection,
  type CollectionRef,
  type Page,
  type PageDocument,
  type PageRevision,
  type PageSummary,
  type PersonRef,
  type RevisionHistoryEntry,
  type RevisionReview,
  type RevisionSummary,
} from '@limitbook/contracts';
import { type CollectionRow, type PageRevisionRow } from '../../../database/schema/index.js';
import { type PageListRow, type PageWithCollection } from '../pages.repository.js';

export type People = Map<string, PersonRef>;

const person = (people: People, id: string | null) => (id ? (people.get(id) ?? null) : null);

export function toCollection(row: CollectionRow, pageCount: number): Collection {
  return {
    id: row.id,
    key: row.key,
    name: row.name,
    description: row.description,
    pageCount,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

export function toCollectionRef(row: CollectionRow): CollectionRef {
  return { id: row.id, key: row.key, name: row.name };
}

export function toRevisionSummary(row: PageRevisionRow): RevisionSummary {
  return {
    id: row.id,
    state: row.state,
    revisionLetter: row.revisionLetter,
    title: row.title,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
    publishedAt: row.publishedAt?.toISOString() ?? null,
  };
}

/** Ids of everyone a revision's answer names, for one people lookup. */
export function revisionPeopleIds(row: PageRevisionRow): (string | null)[] {
  return [row.createdBy, row.updatedBy, row.publishedBy, row.submittedBy, ...row.reviewerIds];
}

function toReview(row: PageRevisionRow, people: People): RevisionReview {
  return {
    submittedAt: row.submittedAt?.toISOString() ?? null,
    submittedBy: person(people, row.submittedBy),
    reviewers: row.reviewerIds.map((id) => people.get(id)).filter((entry): entry is PersonRef => entry !== undefined),
    note: row.submitNote,
    comment: row.reviewComment,
  };
}

export function toHistoryEntry(row: PageRevisionRow, people: People): RevisionHistoryEntry {
  return {
    id: row.id,
    sequence: row.sequence,
    revisionLetter: row.revisionLetter,
    state: row.state,
    title: row.title,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    createdBy: person(people, row.createdBy),
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: person(people, row.updatedBy),
    releasedAt: row.publishedAt?.toISOString() ?? null,
    approvedBy: person(people, row.publishedBy),
    supersededAt: row.supersededAt?.toISOString() ?? null,
    review: toReview(row, people),
    restoredFromId: row.restoredFromId,
  };
}

export function toPageRevision(row: PageRevisionRow, people: People): PageRevision {
  return {
    id: row.id,
    state: row.state,
    sequence: row.sequence,
    revisionLetter: row.revisionLetter,
    title: row.title,
    document: row.document as PageDocument,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    createdBy: person(people, row.createdBy),
    publishedAt: row.publishedAt?.toISOString() ?? null,
    publishedBy: person(people, row.publishedBy),
    supersededAt: row.supersededAt?.toISOString() ?? null,
    review: toReview(row, people),
    restoredFromId: row.restoredFromId,
  };
}

export function toPage(
  { page, collection }: PageWithCollection,
  shown: PageRevisionRow,
  published: PageRevisionRow | undefined,
  draft: PageRevisionRow | undefined,
  people: People,
  fileUrls: Record<string, string>,
  watching: boolean,
): Page {
  return {
    id: page.id,
    documentNumber: page.documentNumber,
    collection: toCollectionRef(collection),
    owner: person(people, page.ownerId),
    tags: page.tags,
    createdAt: page.createdAt.toISOString(),
    updatedAt: page.updatedAt.toISOString(),
    published: published ? toRevisionSummary(published) : null,
    draft: draft ? toRevisionSummary(draft) : null,
    obsolete: page.obsoleteAt ? { at: page.obsoleteAt.toISOString(), by: person(people, page.obsoleteBy), reason: page.obsoleteReason ?? '' } : null,
    watching,
    revision: toPageRevision(shown, people),
    fileUrls,
  };
}

/** Readers get no trace of drafts: no flag, and the publication time as the page's last change. */
export function toPageSummary(row: PageListRow, people: People, seesDrafts: boolean): PageSummary {
  const publishedAt = row.publishedAt?.toISOString() ?? null;
  return {
    id: row.page.id,
    documentNumber: row.page.documentNumber,
    title: row.title,
    collection: toCollectionRef(row.collection),
    owner: person(people, row.page.ownerId),
    tags: row.page.tags,
    updatedAt: seesDrafts ? row.page.updatedAt.toISOString() : (publishedAt ?? row.page.updatedAt.toISOString()),
    publishedAt,
    revisionLetter: row.revisionLetter,
    hasDraft: seesDrafts && row.hasDraft,
    obsolete: row.page.obsoleteAt !== null,
  };
}
