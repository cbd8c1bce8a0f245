import { all, create, type MathJsInstance, type MathNode } from 'mathjs';

/**
 * The one mathjs instance formulas run in. Following the mathjs security guide ("Security",
 * mathjs.org/docs/expressions/security.html), every function that parses, compiles, rewrites
 * or extends the instance is replaced by one that throws. Expressions are parsed with the
 * original parser kept privately here, and are walked against an allow-list before they are
 * compiled, so these overrides are a second wall, not the first.
 */
export interface SandboxedMath {
  math: MathJsInstance;
  parse: (expression: string) => MathNode;
}

export const disabledFunctionNames = [
  'import',
  'createUnit',
  'reviver',
  'replacer',
  'evaluate',
  'parse',
  'compile',
  'parser',
  'simplify',
  'simplifyConstant',
  'simplifyCore',
  'derivative',
  'resolve',
  'rationalize',
  'symbolicEqual',
  'leafCount',
  'chain',
  'help',
  'config',
] as const;

let instance: SandboxedMath | undefined;

export function sandboxedMath(): SandboxedMath {
  instance ??= createSandboxedMath();
  return instance;
}

function createSandboxedMath(): SandboxedMath {
  const math = create(all!, { number: 'number', precision: 64 });
  const parse = math.parse.bind(math) as (expression: string) => MathNode;
  const refusals = Object.fromEntries(
    disabledFunctionNames.filter((name) => name !== 'config').map((name) => [name, refuse(name)]),
  );
  math.import(refusals, { override: true });
  // `config` is a plain property, not a typed function: replace it outright so no formula changes number types.
  (math as unknown as Record<string, unknown>).config = refuse('config');
  return { math, parse };
}

function refuse(name: string): () => never {
  return () => {
    throw new Error(`Function ${name} is disabled`);
  };
}
