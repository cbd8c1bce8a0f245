import { houseMethodPrefix, type MethodDesignSummary, type MethodRevision, type PersonRef } from '@limitbook/contracts';
import { type MethodDesignRevisionRow, type MethodDesignRow } from '../../../database/schema/index.js';

export function revisionPeopleIds(row: MethodDesignRevisionRow): (string | null)[] {
  return [row.createdBy, row.updatedBy, row.releasedBy, row.submittedBy, ...row.reviewerIds];
}

const person = (people: Map<string, PersonRef>, id: string | null) => (id ? (people.get(id) ?? null) : null);

export function toMethodRevision(
  slug: string,
  row: MethodDesignRevisionRow,
  people: Map<string, PersonRef>,
  check: { problems: Record<string, string>; tex: Record<string, string> } = { problems: {}, tex: {} },
): MethodRevision {
  return {
    id: row.id,
    methodId: `${houseMethodPrefix}${slug}`,
    state: row.state,
    methodVersion: row.methodVersion,
    version: row.version,
    definition: row.definition,
    createdAt: row.createdAt.toISOString(),
    createdBy: person(people, row.createdBy),
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: person(people, row.updatedBy),
    releasedAt: row.releasedAt?.toISOString() ?? null,
    approvedBy: person(people, row.releasedBy),
    supersededAt: row.supersededAt?.toISOString() ?? null,
    review: {
      submittedAt: row.submittedAt?.toISOString() ?? null,
      submittedBy: person(people, row.submittedBy),
      reviewers: row.reviewerIds.map((id) => people.get(id)).filter((entry): entry is PersonRef => entry !== undefined),
      note: row.submitNote,
      comment: row.reviewComment,
    },
    restoredFromVersion: row.restoredFromVersion,
    problems: check.problems,
    tex: check.tex,
  };
}

export function toDesignSummary(
  design: MethodDesignRow,
  released: MethodDesignRevisionRow | undefined,
  open: MethodDesignRevisionRow | undefined,
  people: Map<string, PersonRef>,
): MethodDesignSummary {
  const shown = released ?? open;
  return {
    id: `${houseMethodPrefix}${design.slug}`,
    slug: design.slug,
    name: shown?.definition.name ?? design.slug,
    description: shown?.definition.description ?? '',
    owner: person(people, design.ownerId),
    latestVersion: released?.methodVersion ?? null,
    releasedAt: released?.releasedAt?.toISOString() ?? null,
    draft: open ? { state: open.state, version: open.version, updatedAt: open.updatedAt.toISOString() } : null,
    safetyCritical: shown?.definition.safetyCritical ?? false,
    createdAt: design.createdAt.toISOString(),
  };
}
