import { describe, expect, it } from 'vitest';
import { isSafeHref, isSafeImageSrc } from './safe-url.js';

describe('isSafeHref', () => {
  it.each(['https://www.iso.org/standard/45975.html', 'http://example.com', 'mailto:standards@example.com', '/pages/TH-DS-101', '/search?q=wall&tag=ports', '#scope'])(
    'accepts %s',
    (url) => expect(isSafeHref(url)).toBe(true),
  );

  it.each([
    'javascript:alert(1)',
    ' JaVaScRiPt:alert(1)',
    'java\tscript:alert(1)',
    'java\nscript:alert(1)',
    '\u0000javascript:alert(1)',
    '&#106;avascript:alert(1)',
    '&#x6A;avascript:alert(1)',
    'javascript&colon;alert(1)',
    'data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==',
    'vbscript:msgbox(1)',
    'VBScript:msgbox(1)',
    '//evil.example.com',
    '/\\evil.example.com',
    '/&#47;evil.example.com',
    'pages/relative',
    'ftp://example.com',
    'https://exa mple.com',
    'https://example.com/\u202e',
    '',
    `https://example.com/${'a'.repeat(3000)}`,
  ])('refuses %j', (url) => expect(isSafeHref(url)).toBe(false));

  it('refuses what is not a string', () => {
    expect(isSafeHref(null)).toBe(false);
    expect(isSafeHref({ href: 'https://example.com' })).toBe(false);
  });
});

describe('isSafeImageSrc', () => {
  it.each(['/api/files/c3d4e5f6-a7b8-4c9d-8e0f-1a2b3c4d5e6f', 'https://example.com/figure.png'])('accepts %s', (src) =>
    expect(isSafeImageSrc(src)).toBe(true),
  );

  it.each([
    'data:text/html,<script>alert(1)</script>',
    'data:image/png;base64,iVBORw0KGgo=',
    'javascript:alert(1)',
    '/api/files/not-a-uuid',
    '/api/files/c3d4e5f6-a7b8-4c9d-8e0f-1a2b3c4d5e6f/../../admin',
    '/pages/TH-DS-101',
    'blob:https://example.com/1',
  ])('refuses %j', (src) => expect(isSafeImageSrc(src)).toBe(false));
});
