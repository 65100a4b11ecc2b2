import type { LogPiece } from './log-piece';
import { parameterPieces } from './parameter-pieces';
import { pointPieces } from './point-pieces';
import type { SoaCondition, SoaModel } from './types';

/** Every limit of the model at a condition, and the voltage limit above which nothing is allowed. */
export function soaPieces(model: SoaModel, cond: SoaCondition): { pieces: LogPiece[]; vceMaxV: number } {
  if (model.kind === 'parameters') return { pieces: parameterPieces(model, cond), vceMaxV: model.vceoV };
  return pointPieces(model, cond);
}
