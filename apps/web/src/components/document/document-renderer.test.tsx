import { everyNodeDocument, sampleFileId } from '@limitbook/editor-schema/testing';
import { describe, expect, it } from 'vitest';
import { render, screen, within } from '@/testing/render';
import { DocumentRenderer } from './document-renderer';
import type { DocNode } from './outline';

const signed = `/api/files/signed?u=${sampleFileId}&exp=1&sig=x`;

function allHrefs(container: HTMLElement) {
  return [...container.querySelectorAll('[href]')].map((element) => element.getAttribute('href') ?? '');
}

describe('DocumentRenderer', () => {
  it('renders every node and mark the editor can produce', () => {
    const { container } = render(
      <DocumentRenderer document={everyNodeDocument() as DocNode} fileUrls={{ [sampleFileId]: signed }} renderCalculator={(attrs) => <p>Block {String(attrs.caption)}</p>} />,
    );
    // Headings move down a level below the page title, with anchors for the contents.
    expect(screen.getByRole('heading', { level: 2, name: 'TH-DS-204 Cross-drilled ports near a bore' })).toHaveAttribute('id', 's-th-ds-204-cross-drilled-ports-near-a-bore');
    expect(screen.getByRole('heading', { level: 5, name: 'Purpose' })).toBeInTheDocument();
    expect(screen.getByText('checked').closest('strong')).not.toBeNull();
    expect(screen.getByText('LMC').closest('em')).not.toBeNull();
    expect(screen.getByText('LMC').closest('u')).not.toBeNull();
    expect(screen.getByText('assumed').closest('s')).not.toBeNull();
    expect(screen.getByText('minWall').closest('code')).not.toBeNull();

    const external = screen.getByRole('link', { name: 'ASME Y14.5' });
    expect(external).toHaveAttribute('href', 'https://www.asme.org/');
    expect(external).toHaveAttribute('target', '_blank');
    expect(external.getAttribute('rel')).toContain('noopener');
    expect(screen.getByRole('link', { name: 'TH-DS-101' })).toHaveAttribute('href', '/pages/TH-DS-101');
    expect(screen.getByRole('link', { name: 'the standards office' })).toHaveAttribute('href', 'mailto:standards@example.com');

    expect(container.querySelector('br')).not.toBeNull();
    expect(container.querySelectorAll('[data-latex-state]').length).toBeGreaterThanOrEqual(2);
    expect(container.querySelectorAll('ul').length).toBeGreaterThanOrEqual(2);
    expect(container.querySelector('ol[start="3"]')).not.toBeNull();
    expect(container.querySelector('blockquote')).toHaveTextContent('A wall is not a pressure rating.');
    expect(container.querySelector('pre code')).toHaveTextContent('minWall >= 1.5 mm');
    expect(container.querySelector('hr')).not.toBeNull();

    const table = screen.getByRole('table');
    expect(within(table).getByRole('columnheader', { name: 'Minimum wall' })).toBeInTheDocument();
    expect(within(table).getByRole('cell', { name: '1.5 mm' })).toHaveStyle({ textAlign: 'right' });

    // Uploaded images use the page's signed address; an outside image its own.
    expect(screen.getByRole('img', { name: 'Section A–A through port P1' })).toHaveAttribute('src', signed);
    expect(container.querySelector('img[src="https://example.com/figure.png"]')).not.toBeNull();
    expect(screen.getByRole('link', { name: 'port-wall-study.pdf' })).toHaveAttribute('href', `${signed}&download=1`);
    expect(screen.getByText(/47 KB · application\/pdf/)).toBeInTheDocument();

    expect(screen.getByRole('note', { name: 'Warning' })).toHaveTextContent('not a pressure rating');
    expect(screen.getByRole('note', { name: 'Note' })).toBeInTheDocument();
    expect(screen.getByRole('note', { name: 'Caution' })).toHaveTextContent('Check the mating part.');
    expect(screen.getByText('Block Port P1 to main bore wall')).toBeInTheDocument();
    expect(screen.getByText('Block Shaft end play')).toBeInTheDocument();

    expect(allHrefs(container).some((href) => /^\s*javascript:/i.test(href))).toBe(false);
  });

  it('never turns a hostile link or image into something that runs', () => {
    const hostile: DocNode = {
      type: 'doc',
      content: [
        {
          type: 'paragraph',
          content: [
            { type: 'text', text: 'click', marks: [{ type: 'link', attrs: { href: 'javascript:alert(1)' } }] },
            { type: 'text', text: ' spaced', marks: [{ type: 'link', attrs: { href: ' JaVaScRiPt:alert(1)' } }] },
            { type: 'text', text: ' data', marks: [{ type: 'link', attrs: { href: 'data:text/html,<script>alert(1)</script>' } }] },
            { type: 'text', text: '<img src=x onerror=alert(1)>' },
          ],
        },
        { type: 'image', attrs: { src: 'javascript:alert(1)', alt: 'bad' } },
        { type: 'script', content: [{ type: 'text', text: 'alert(1)' }] } as DocNode,
      ],
    };
    const { container } = render(<DocumentRenderer document={hostile} />);
    expect(allHrefs(container)).toEqual([]);
    expect(container.querySelector('img')).toBeNull();
    expect(container.querySelector('script')).toBeNull();
    expect(screen.getByText('<img src=x onerror=alert(1)>')).toBeInTheDocument();
    expect(screen.getByText('click')).toBeInTheDocument();
  });
});
