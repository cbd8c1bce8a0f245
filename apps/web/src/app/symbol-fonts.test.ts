import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import { openSync, type Font } from 'fontkit';
import { describe, expect, it } from 'vitest';

// The characters of ASME Y14.5-2018 §3 / ISO 1101 symbols as Unicode maps them (reference sheet §8).
const gdtSymbols = {
  position: '⌖',
  flatness: '⏥',
  straightness: '⏤',
  circularity: '○',
  cylindricity: '⌭',
  'profile of a line': '⌒',
  'profile of a surface': '⌓',
  parallelism: '∥',
  perpendicularity: '⟂',
  angularity: '∠',
  'circular run-out': '↗',
  'total run-out': '⌰',
  diameter: '⌀',
  MMC: 'Ⓜ',
  LMC: 'Ⓛ',
  'free state': 'Ⓕ',
  'projected tolerance zone': 'Ⓟ',
  'statistical tolerance': 'Ⓢ',
  'tangent plane': 'Ⓣ',
  'unequally disposed profile': 'Ⓤ',
};

type Face = { file: string; ranges: [number, number][] };

function facesOf(css: string): Face[] {
  const require = createRequire(import.meta.url);
  return [...css.matchAll(/@font-face\s*{([^}]*)}/g)].map(([, body = '']) => {
    const file = /url\('([^']+)'\)/.exec(body)?.[1] ?? '';
    const ranges = (/unicode-range:\s*([^;]+);/.exec(body)?.[1] ?? '').split(',').map((part) => {
      const [from = '', to] = part.trim().replace(/^U\+/, '').split('-');
      return [parseInt(from, 16), parseInt(to ?? from, 16)] as [number, number];
    });
    return { file: require.resolve(file), ranges };
  });
}

describe('the GD&T symbol font', () => {
  const faces = facesOf(readFileSync(join(import.meta.dirname, 'symbol-fonts.css'), 'utf8'));
  const fonts = new Map(faces.map((face) => [face.file, openSync(face.file) as Font]));

  it.each(Object.entries(gdtSymbols))('draws %s (%s) from a face that has the glyph', (_name, symbol) => {
    const codePoint = symbol.codePointAt(0) ?? 0;
    const face = faces.find((candidate) => candidate.ranges.some(([from, to]) => codePoint >= from && codePoint <= to));
    expect(face, `no face's unicode-range covers U+${codePoint.toString(16).toUpperCase()}`).toBeDefined();
    expect(fonts.get(face!.file)?.hasGlyphForCodePoint(codePoint)).toBe(true);
  });
});
