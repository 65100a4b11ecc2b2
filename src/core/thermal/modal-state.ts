import type { ModalModel } from './types';

/** Modal state x = P T from node temperatures (°C); massless nodes are ignored. */
export function modalFromTemperatures(model: ModalModel, temperatures: ArrayLike<number>, out?: Float64Array): Float64Array {
  throw new Error('not implemented yet');
}

/** Node temperatures T = W x + D u (°C); massless nodes follow the inputs u. */
export function temperaturesFromModal(model: ModalModel, x: ArrayLike<number>, u: ArrayLike<number>, out?: Float64Array): Float64Array {
  throw new Error('not implemented yet');
}
