import { formulaLimits, formulaNamePattern } from '@limitbook/contracts';
import { allowedConstants, allowedFunctions, parserKeywords } from './formula-allow-list.js';
import { disabledFunctionNames, type SandboxedMath } from './sandboxed-math.js';

/**
 * Why a name cannot hold a value, or undefined when it can. Values are looked up before mathjs'
 * own functions, so a name such as `squeeze` or `range` simply means the value; only callable
 * functions, constants, parser words and JavaScript object properties are refused. Units may
 * be shadowed (see `shadowsUnit`).
 */
export function formulaNameProblem(name: string): string | undefined {
  if (name.length > formulaLimits.maxNameLength) return `A name is at most ${formulaLimits.maxNameLength} characters`;
  if (!formulaNamePattern.test(name)) return `"${name}" is not a name: start with a letter, then letters, digits or _`;
  if (parserKeywords.has(name)) return `${name} is a word of the formula language; choose another name`;
  if (allowedConstants.has(name)) return `${name} is the constant ${name === 'e' ? "(Euler's number)" : ''} ${name}; choose another name`.replace(/\s+/g, ' ');
  if (allowedFunctions.has(name) || (disabledFunctionNames as readonly string[]).includes(name)) return `${name} is the name of a function; choose another name`;
  if (name in Object.prototype) return `${name} is a reserved word; choose another name`;
  return undefined;
}

export function shadowsUnit(name: string, { math }: SandboxedMath): boolean {
  return math.Unit.isValuelessUnit(name);
}
