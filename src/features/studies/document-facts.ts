import type { Ambient, Device, PackageModel, Profile, Sink, StudyDocument } from '@/core/study';

import { formatDuration, formatQuantity, formatRange } from './quantity-format';

/** One labelled line of the read-only summary. */
export type Fact = { label: string; value: string };

/** Junction-to-case resistance of a package model: the sum of its series resistances. */
export function packageRthKPerW(model: PackageModel): number {
  if (model.kind === 'foster') return model.terms.reduce((sum, term) => sum + term.rKPerW, 0);
  if (model.kind === 'cauer') return model.stages.reduce((sum, stage) => sum + stage.rKPerW, 0);
  return model.rthKPerW;
}

function packageLabel(model: PackageModel): string {
  if (model.kind === 'foster') return `Foster, ${model.terms.length} terms`;
  if (model.kind === 'cauer') return `Cauer, ${model.stages.length} stages`;
  return 'single RC';
}

function ambientLabel(ambient: Ambient): string {
  if (ambient.kind === 'constant') return formatQuantity(ambient.temperatureC, '°C');
  const temperatures = ambient.points.map((point) => point.temperatureC);
  return `${formatRange(temperatures, '°C')}, ${ambient.points.length} points (${ambient.interpolation})`;
}

export function conditionFacts(document: StudyDocument): Fact[] {
  const facts: Fact[] = [
    { label: 'Ambient', value: ambientLabel(document.ambient) },
    { label: 'Target margin below Tj max', value: formatQuantity(document.marginK, 'K') },
  ];
  if (document.enclosure) {
    facts.push({
      label: 'Enclosure',
      value: `Rθ ${formatQuantity(document.enclosure.rthKPerW, 'K/W')}, ${formatQuantity(document.enclosure.capacityJPerK, 'J/K')}`,
    });
  }
  return facts;
}

export function deviceFacts(device: Device): string[] {
  return [
    device.count > 1 ? `${device.count} in parallel` : 'single part',
    `Tj max ${formatQuantity(device.tjMaxC, '°C')}`,
    `Rθjc ${formatQuantity(packageRthKPerW(device.package), 'K/W')} (${packageLabel(device.package)})`,
    `interface ${formatQuantity(device.interfaceRthKPerW, 'K/W')}`,
    `on ${device.sink}`,
  ];
}

export function sinkFacts(sink: Sink): string[] {
  const cooling = sink.forcedAir
    ? `forced air at ${formatQuantity(sink.forcedAir.airSpeedMPerS, 'm/s')}`
    : sink.naturalConvection
      ? 'natural convection'
      : 'fixed Rθsa';
  return [
    `Rθsa ${formatQuantity(sink.rthKPerW, 'K/W')}`,
    `heat capacity ${formatQuantity(sink.capacityJPerK, 'J/K')}`,
    cooling,
    `to ${sink.to}`,
  ];
}

export function profileFacts(profile: Profile): Fact[] {
  const segments = profile.segments;
  const duration = segments.reduce((sum, segment) => sum + segment.durationS, 0);
  const loads = segments.flatMap((segment) => (segment.electrical ? [segment.electrical.iloadA] : []));
  const inputs = segments.flatMap((segment) => (segment.electrical ? [segment.electrical.vinV] : []));
  const facts: Fact[] = [
    { label: 'Segments', value: String(segments.length) },
    { label: 'Length of one pass', value: formatDuration(duration) },
    {
      label: 'Runs',
      value: profile.periodic
        ? 'periodic steady state (the pass repeated forever)'
        : profile.repeat === 1
          ? 'once'
          : `${profile.repeat} passes`,
    },
  ];
  if (inputs.length > 0) facts.push({ label: 'Input voltage', value: formatRange(inputs, 'V') });
  if (loads.length > 0) facts.push({ label: 'Load current', value: formatRange(loads, 'A') });
  return facts;
}
