/** Words for the keys of a part's API paths, to name a field in a list of problems. */
const KEY_LABEL: Record<string, string> = {
  name: 'Name',
  kind: 'Kind',
  packageName: 'Package',
  description: 'Description',
  notes: 'Notes',
  tjMaxC: 'Tj,max',
  thermal: 'Thermal model',
  terms: 'term',
  stages: 'stage',
  rKPerW: 'R',
  tauS: 'τ',
  capacityJPerK: 'C',
  rthKPerW: 'Rθjc',
  electrical: 'Electrical model',
  iqA: 'Iq',
  dropout: 'dropout',
  currentLimit: 'current limit',
  points: 'point',
  currentA: 'current',
  voltageV: 'voltage',
  differentialV: 'Vin − Vout',
  thermalShutdown: 'thermal shutdown',
  tripC: 'trip temperature',
  hysteresisK: 'hysteresis',
  soa: 'SOA',
  icMaxA: 'Ic,max',
  icPulseMaxA: 'peak pulse current',
  vceoV: 'Vceo',
  rthJcKPerW: 'Rθjc',
  secondBreakdown: 'second breakdown',
  referenceVceV: 'V0',
  referenceIcA: 'I0',
  exponent: 'exponent',
  derating: 'derating',
  fractionPerK: 'fraction per K',
  curves: 'curve',
  pulseS: 'pulse',
  vceV: 'Vce',
  icA: 'Ic',
  zthJc: 'Zθjc',
  linearMode: 'linear mode',
  longestRatedPulseS: 'longest rated pulse',
  transistor: 'transistor',
  zthPoints: 'Zth points',
  zthFit: 'Zth fit',
};

/** "soa.curves[0].points[2].icA" → "SOA, curve 1, point 3, Ic". */
export function pathLabel(path: string): string {
  const parts: string[] = [];
  for (const token of path.split('.')) {
    const m = /^([^[]+)((?:\[\d+\])*)$/.exec(token);
    if (!m) {
      parts.push(token);
      continue;
    }
    const indexes = [...m[2].matchAll(/\[(\d+)\]/g)].map((x) => Number(x[1]) + 1);
    const word = KEY_LABEL[m[1]] ?? m[1];
    parts.push(indexes.length ? `${word} ${indexes.join('.')}` : word);
  }
  return parts.join(', ');
}

/** The message for a path, or for the first of its sub-paths that has one. */
export function messageAt(messages: Record<string, string>, path: string): string | undefined {
  if (path in messages) return messages[path];
  const key = Object.keys(messages).find((k) => k.startsWith(`${path}.`) || k.startsWith(`${path}[`));
  return key === undefined ? undefined : messages[key];
}
