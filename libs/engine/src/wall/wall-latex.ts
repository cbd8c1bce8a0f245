import type { MaterialConditionSizes } from '../boundary/material-condition-sizes.js';
import type { WallAtSizes, WallModel } from './wall-at-sizes.js';
import type { WallGeometry } from './wall-geometry.js';

// LaTeX fragments of the wall derivation: the formula per geometry and the same with numbers substituted.

export function geometryText(geometry: WallGeometry): string {
  if (geometry.kind === 'between') return geometry.datumIsPlane ? 'hole beside a plane datum face' : 'two internal features side by side';
  const inner = geometry.outer === 'datum' ? 'located internal feature' : 'internal datum feature';
  return geometry.basicDistance === 0 ? `${inner} coaxial within the external one` : `${inner} off-centre within the external one`;
}

export function wallFormula(geometry: WallGeometry): string {
  if (geometry.kind === 'between') {
    return geometry.datumIsPlane ? 'w = (L + \\delta) - \\tfrac{D_f}{2}' : 'w = (L + \\delta) - \\tfrac{D_f}{2} - \\tfrac{D_d}{2}';
  }
  const [outer, inner] = geometry.outer === 'datum' ? ['D_d', 'D_f'] : ['D_f', 'D_d'];
  const centres = geometry.basicDistance === 0 ? '\\delta' : '(L + \\delta)';
  return `w = \\tfrac{${outer}}{2} - \\tfrac{${inner}}{2} - ${centres}`;
}

export function wallSubstituted(geometry: WallGeometry, wall: WallAtSizes, offset: number, len: (value: number) => string): string {
  const signed = (value: number) => (value < 0 ? `- ${len(-value)}` : `+ ${len(value)}`);
  const half = (size: number) => `\\tfrac{${len(size)}}{2}`;
  if (geometry.kind === 'between') {
    const datumTerm = geometry.datumIsPlane ? '' : ` - ${half(wall.datumSize ?? 0)}`;
    return `(${len(geometry.basicDistance)} ${signed(offset)}) - ${half(wall.featureSize)}${datumTerm}`;
  }
  const [outer, inner] = geometry.outer === 'datum' ? [wall.datumSize ?? 0, wall.featureSize] : [wall.featureSize, wall.datumSize ?? 0];
  if (geometry.basicDistance === 0) return `${half(outer)} - ${half(inner)} ${signed(-offset)}`;
  return `${half(outer)} - ${half(inner)} - (${len(geometry.basicDistance)} ${signed(offset)})`;
}

export function bonusFormula(model: WallModel): string {
  if (model.toleranceModifier === 'RFS') return 'B = 0\\ (\\text{RFS})';
  return `B = \\lvert D_f - \\mathrm{${model.toleranceModifier}}_f \\rvert`;
}

export function shiftFormula(model: WallModel): string {
  if (model.datum === null || model.datumModifier === 'RMB') return `S = 0\\ (\\text{${model.datum === null ? 'plane datum' : 'RMB'}})`;
  return `S = \\lvert D_d - \\mathrm{${model.datumModifier}} \\rvert`;
}

export function bonusSubstituted(model: WallModel, wall: WallAtSizes, len: (value: number) => string): string {
  if (model.toleranceModifier === 'RFS') return 'B = 0';
  const from = conditionSize(model.feature, model.toleranceModifier === 'MMC' ? 'mmc' : 'lmc');
  return `B = \\lvert ${len(wall.featureSize)} - ${len(from)} \\rvert = ${len(wall.bonus)}`;
}

export function shiftSubstituted(model: WallModel, wall: WallAtSizes, len: (value: number) => string): string {
  if (model.datum === null || model.datumModifier === 'RMB' || wall.datumSize === null) return 'S = 0';
  const from = conditionSize(model.datum, model.datumModifier === 'MMB' ? 'mmc' : 'lmc');
  return `S = \\lvert ${len(wall.datumSize)} - ${len(from)} \\rvert = ${len(wall.datumShift)}`;
}

export function conditionSize(sizes: MaterialConditionSizes, condition: 'mmc' | 'lmc'): number {
  return condition === 'mmc' ? sizes.mmcSize : sizes.lmcSize;
}
