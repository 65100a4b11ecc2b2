import * as initial from './0001-initial';
import * as teamWork from './0002-team-work';
import * as catalogues from './0003-catalogues';
import * as parts from './0004-parts';
import * as teamSettings from './0005-team-settings';
import * as authAttempts from './0006-auth-attempts';
import * as convectionExponent from './0007-convection-exponent';

/** Every migration, in order. Add new ones at the end; never edit one that has shipped. */
export const migrations = [
  { name: '0001-initial', ...initial },
  { name: '0002-team-work', ...teamWork },
  { name: '0003-catalogues', ...catalogues },
  { name: '0004-parts', ...parts },
  { name: '0005-team-settings', ...teamSettings },
  { name: '0006-auth-attempts', ...authAttempts },
  { name: '0007-convection-exponent', ...convectionExponent },
];
