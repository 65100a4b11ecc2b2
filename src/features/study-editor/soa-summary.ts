import type { RawObject } from './types';

const n = (v: unknown, unit: string) => (typeof v === 'number' ? `${Number(v.toPrecision(4))} ${unit}` : '—');
const pulse = (p: unknown) => (p === 'dc' ? 'DC' : typeof p === 'number' ? (p < 1 ? `${Number((p * 1000).toPrecision(4))} ms` : `${p} s`) : '?');

const TRANSISTOR_NAMES: Record<string, string> = { bipolar: 'bipolar transistor', darlington: 'Darlington', mosfet: 'MOSFET' };

/** The SOA model in a few plain lines (it is entered in the parts library, shown here read-only). */
export function soaLines(soa: RawObject): string[] {
  const lines: string[] = [];
  const transistor = typeof soa.transistor === 'string' ? (TRANSISTOR_NAMES[soa.transistor] ?? soa.transistor) : 'transistor';
  if (soa.kind === 'parameters') {
    lines.push(`From parameters, ${transistor}: Ic,max ${n(soa.icMaxA, 'A')}, Vceo ${n(soa.vceoV, 'V')}, Rθjc ${n(soa.rthJcKPerW, 'K/W')}, Tj,max ${n(soa.tjMaxC, '°C')}`);
    if (soa.icPulseMaxA !== undefined) lines.push(`Pulse current ${n(soa.icPulseMaxA, 'A')}`);
    const sb = soa.secondBreakdown as RawObject | undefined;
    if (sb) lines.push(`Second breakdown through ${n(sb.referenceIcA, 'A')} at ${n(sb.referenceVceV, 'V')}, exponent ${n(sb.exponent, '')}`.trim());
  } else if (soa.kind === 'points') {
    const curves = Array.isArray(soa.curves) ? (soa.curves as RawObject[]) : [];
    lines.push(`From datasheet curves, ${transistor}: ${curves.length} ${curves.length === 1 ? 'curve' : 'curves'} (${curves.map((c) => pulse(c.pulseS)).join(', ')}), Tj,max ${n(soa.tjMaxC, '°C')}`);
  } else {
    lines.push(`Model of kind ${JSON.stringify(soa.kind)}`);
  }
  if (Array.isArray(soa.zthJc)) lines.push(`Zθjc for pulses: ${soa.zthJc.length} Foster ${soa.zthJc.length === 1 ? 'term' : 'terms'}`);
  const linear = soa.linearMode as RawObject | undefined;
  if (linear) lines.push(linear.dcRated ? 'Rated for DC in linear mode' : `Not rated for DC in linear mode${linear.longestRatedPulseS !== undefined ? `; rated pulses up to ${pulse(linear.longestRatedPulseS)}` : ''}`);
  return lines;
}
