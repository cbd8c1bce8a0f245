import type { MethodSummary } from '@limitbook/contracts';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { jsonResponse, render, screen, within } from '@/testing/render';
import { MethodsCatalog } from './methods-catalog';

const method = (id: string, title: string, extra: Partial<MethodSummary> = {}): MethodSummary => ({
  id,
  version: 1,
  title,
  description: 'What it computes. More detail.',
  references: ['ASME Y14.5-2018'],
  cautions: [],
  inputSchema: {},
  outputs: [],
  ...extra,
});

const usage = (pageId: string, blockId: string) => ({
  pageId,
  documentNumber: `BW-STD-${pageId}`,
  title: 'Page',
  revisionId: `r-${pageId}`,
  state: 'released',
  revisionLetter: 'A',
  blockId,
  caption: '',
  methodVersion: 1,
});

function stubServer() {
  const fetch = vi.fn(async (input: RequestInfo | URL) => {
    const url = String(input);
    if (url.endsWith('/api/methods')) return jsonResponse(200, { items: [method('wall-thickness', 'Wall between two features'), method('house:gland-squeeze', 'Gland squeeze', { source: 'in-house', version: 3 })] });
    if (url.includes('/api/methods/wall-thickness/usage')) return jsonResponse(200, { id: 'wall-thickness', source: 'built-in', latestVersion: 1, usages: [usage('101', 'b1'), usage('101', 'b2'), usage('102', 'b3')], tests: [] });
    if (url.includes('/usage')) return jsonResponse(200, { id: 'house:gland-squeeze', source: 'in-house', latestVersion: 3, usages: [], tests: [] });
    return jsonResponse(404, { statusCode: 404, code: 'NOT_FOUND', message: 'Not found' });
  });
  vi.stubGlobal('fetch', fetch);
}

describe('MethodsCatalog', () => {
  afterEach(() => vi.unstubAllGlobals());

  it('lists built-in and in-house methods with their version and the pages that use them', async () => {
    stubServer();
    render(<MethodsCatalog canDesign={false} />);
    const table = await screen.findByRole('table', { name: 'Methods' });
    const wall = within(table).getByText('Wall between two features').closest('tr') as HTMLElement;
    expect(within(wall).getByText('Built-in')).toBeInTheDocument();
    // Three blocks on two pages count as two pages.
    expect(await within(wall).findByText('2 pages')).toBeInTheDocument();
    const house = within(table).getByText('Gland squeeze').closest('tr') as HTMLElement;
    expect(within(house).getByText('v3')).toBeInTheDocument();
    expect(await within(house).findByText('Not used yet')).toBeInTheDocument();
    expect(screen.queryByRole('link', { name: 'New method' })).toBeNull();
  });

  it('filters by kind and text, and offers a new method to those who may design', async () => {
    stubServer();
    const { user } = render(<MethodsCatalog canDesign />);
    await screen.findByRole('table', { name: 'Methods' });
    expect(screen.getByRole('link', { name: 'New method' })).toBeInTheDocument();

    await user.click(screen.getByRole('radio', { name: 'In-house' }));
    expect(screen.queryByText('Wall between two features')).toBeNull();
    expect(screen.getByText('Gland squeeze')).toBeInTheDocument();

    await user.type(screen.getByRole('textbox', { name: 'Find a method' }), 'wall');
    expect(screen.getByText('No method matches these filters.')).toBeInTheDocument();
  });
});
