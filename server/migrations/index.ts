import * as initial from './0001-initial';

/** Every migration, in order. Add new ones at the end; never edit one that has shipped. */
export const migrations = [{ name: '0001-initial', ...initial }];
