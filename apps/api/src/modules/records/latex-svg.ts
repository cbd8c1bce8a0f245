import { liteAdaptor } from 'mathjax-full/js/adaptors/liteAdaptor.js';
import { RegisterHTMLHandler } from 'mathjax-full/js/handlers/html.js';
import { AllPackages } from 'mathjax-full/js/input/tex/AllPackages.js';
import { TeX } from 'mathjax-full/js/input/tex.js';
import { mathjax } from 'mathjax-full/js/mathjax.js';
import { SVG } from 'mathjax-full/js/output/svg.js';

type MathDocument = ReturnType<typeof mathjax.document>;
type Adaptor = ReturnType<typeof liteAdaptor>;

let converter: { adaptor: Adaptor; document: MathDocument } | undefined;

/** Built once: MathJax's setup is the slow part, each conversion after it is quick. */
function getConverter() {
  if (!converter) {
    const adaptor = liteAdaptor();
    RegisterHTMLHandler(adaptor);
    // `noerrors` off: a formula MathJax cannot parse must throw so the caller can fall back to text.
    const tex = new TeX({ packages: AllPackages.filter((name) => name !== 'bussproofs'), formatError: (_jax: unknown, error: Error) => { throw error; } });
    const svg = new SVG({ fontCache: 'none' });
    converter = { adaptor, document: mathjax.document('', { InputJax: tex, OutputJax: svg }) };
  }
  return converter;
}

/** Renders TeX to a standalone SVG string with MathJax's lite DOM (no browser). Throws on TeX it cannot parse. */
export function latexToSvg(latex: string): string {
  const { adaptor, document } = getConverter();
  const node = document.convert(latex, { display: true });
  return adaptor.innerHTML(node);
}
