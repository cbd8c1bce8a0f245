import type { EvaluationResult, MethodSummary, Page } from '@limitbook/contracts';

const limit = { type: 'number', exclusiveMinimum: 0 };

/** The wall-thickness method as the catalog describes it (inputs trimmed to what the tests use). */
export const wallMethod: MethodSummary = {
  id: 'wall-thickness',
  version: 1,
  title: 'Wall between two features of size located by position',
  description: 'Minimum and maximum wall between a located feature of size and its datum feature.',
  references: [],
  cautions: [],
  inputSchema: {
    type: 'object',
    properties: {
      arrangement: { type: 'string', enum: ['coaxial', 'side-by-side'] },
      feature: {
        type: 'object',
        properties: { featureType: { type: 'string', enum: ['internal', 'external'] }, lowerLimit: limit, upperLimit: limit },
        required: ['featureType', 'lowerLimit', 'upperLimit'],
      },
      positionTolerance: { type: 'number', minimum: 0, description: 'Position tolerance of the located feature, a diameter' },
      toleranceModifier: { type: 'string', enum: ['MMC', 'LMC', 'RFS'] },
    },
    required: ['arrangement', 'feature', 'positionTolerance', 'toleranceModifier'],
  },
  outputs: [
    { name: 'minWall', label: 'Minimum wall', kind: 'length', description: 'Thinnest wall.' },
    { name: 'maxWall', label: 'Maximum wall', kind: 'length', description: 'Thickest wall.' },
  ],
};

export const wallResult: EvaluationResult = {
  method: 'wall-thickness',
  version: 1,
  unit: 'mm',
  outputs: { minWall: 4.7, maxWall: 5.3 },
  warnings: [],
  steps: [{ label: 'Minimum wall', latex: 'W_{min} = 4.7', value: '4.7 mm' }],
};

const person = { id: '5f0c6b7e-1d2a-4c3b-9e8f-7a6b5c4d3e2f', name: 'Idris Okafor', email: 'idris.okafor@brackwater.example' };

/** A page with its draft at `version`, as `GET /api/pages/:ref?view=draft` answers. */
export function draftPage(version: number, text = 'Purpose of the rule.', title = 'Port walls'): Page {
  const at = '2026-03-02T10:00:00.000Z';
  return {
    id: '0b7d1e9a-4c2f-4e8b-9a6d-3f5e7c1b2a90',
    documentNumber: 'BW-STD-900',
    collection: { id: 'c1', key: 'design-rules', name: 'Design rules' },
    owner: person,
    tags: [],
    createdAt: at,
    updatedAt: at,
    published: null,
    draft: { id: 'r1', state: 'draft', revisionLetter: null, title, version, updatedAt: at, publishedAt: null },
    obsolete: null,
    watching: false,
    revision: {
      id: 'r1',
      state: 'draft',
      sequence: 1,
      revisionLetter: null,
      title,
      document: { type: 'doc', content: [{ type: 'paragraph', content: [{ type: 'text', text }] }] },
      version,
      createdAt: at,
      updatedAt: at,
      createdBy: person,
      publishedAt: null,
      publishedBy: null,
      supersededAt: null,
      review: { submittedAt: null, submittedBy: null, reviewers: [], note: null, comment: null },
      restoredFromId: null,
    },
    fileUrls: {},
  };
}
