import { describe, expect, it } from 'vitest';
import { render, screen } from '@/testing/render';
import { HighlightedText, normalizeRanges } from './highlighted-text';

describe('HighlightedText', () => {
  it('marks the matched ranges and shows markup in the text as text', () => {
    const text = 'Wall <b>near</b> the bore';
    render(
      <p data-testid="snippet">
        <HighlightedText text={text} ranges={[{ start: 21, end: 25 }, { start: 0, end: 4 }]} />
      </p>,
    );
    const snippet = screen.getByTestId('snippet');
    expect([...snippet.querySelectorAll('mark')].map((mark) => mark.textContent)).toEqual(['Wall', 'bore']);
    expect(snippet.querySelector('b')).toBeNull();
    expect(snippet.textContent).toBe(text);
  });

  it('merges overlapping ranges and drops those outside the text', () => {
    expect(normalizeRanges([{ start: 5, end: 9 }, { start: 2, end: 6 }, { start: 40, end: 50 }, { start: 3, end: 3 }], 20)).toEqual([{ start: 2, end: 9 }]);
  });
});
