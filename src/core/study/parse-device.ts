import { DEVICE_KINDS, type Device, type DeviceKind } from './types';
import { asObject, fieldPath, onlyKeys, rangeFail, readId, readNumber, readOptionalNumber, readOptionalString } from './field-reader';
import { parsePackage } from './parse-package';
import { parseElectrical } from './parse-electrical';
import { parseSoa } from './parse-soa';

const DEVICE_KEYS = ['id', 'name', 'notes', 'tjMaxC', 'sink', 'count', 'package', 'interface', 'electrical', 'kind', 'partId', 'soa'];

/** `kind` and `partId` (informational), and the SOA model, which must match the kind. */
function readPart(obj: Record<string, unknown>, path: string, device: Device): void {
  const kind = readOptionalString(obj, 'kind', path);
  if (kind !== undefined) {
    if (!DEVICE_KINDS.includes(kind as DeviceKind)) rangeFail(fieldPath(path, 'kind'), `must be one of ${DEVICE_KINDS.join(', ')}, got ${JSON.stringify(kind)}`);
    device.kind = kind as DeviceKind;
  }
  const partId = readOptionalNumber(obj, 'partId', path, { min: 1, integer: true });
  if (partId !== undefined) device.partId = partId;
  if (obj.soa === undefined) return;
  const soaPath = fieldPath(path, 'soa');
  if (device.kind === 'regulator') rangeFail(soaPath, 'an integrated regulator has no SOA model here (its current limit and thermal shutdown protect it); remove soa or change kind');
  device.soa = parseSoa(obj.soa, soaPath);
  if (device.kind !== undefined && device.soa.transistor !== device.kind) {
    rangeFail(fieldPath(soaPath, 'transistor'), `must match the device kind ${JSON.stringify(device.kind)}, got ${JSON.stringify(device.soa.transistor)}`);
  }
}

/** Reads `devices[i]`; the sink reference is checked by the caller, which knows the sinks. */
export function parseDevice(value: unknown, path: string): Device {
  const obj = asObject(value, path);
  onlyKeys(obj, DEVICE_KEYS, path);
  const interfacePath = fieldPath(path, 'interface');
  const iface = asObject(obj.interface, interfacePath);
  onlyKeys(iface, ['rthKPerW', 'material', 'notes'], interfacePath);
  readOptionalString(iface, 'material', interfacePath);
  readOptionalString(obj, 'notes', path);
  const device: Device = {
    id: readId(obj, 'id', path),
    tjMaxC: readNumber(obj, 'tjMaxC', path, { min: -273.15, exclusive: true, unit: '°C' }),
    sink: readId(obj, 'sink', path),
    count: readOptionalNumber(obj, 'count', path, { min: 1, integer: true, max: 1000 }) ?? 1,
    package: parsePackage(obj.package, fieldPath(path, 'package')),
    interfaceRthKPerW: readNumber(iface, 'rthKPerW', interfacePath, { min: 0, exclusive: true, unit: 'K/W' }),
  };
  const name = readOptionalString(obj, 'name', path);
  if (name !== undefined) device.name = name;
  if (obj.electrical !== undefined) device.electrical = parseElectrical(obj.electrical, fieldPath(path, 'electrical'));
  // Without heat capacity at the junction, Tj jumps with the power: a shutdown would trip and
  // resume at the same instant without end.
  if (device.electrical?.thermalShutdown && device.package.kind === 'lumped' && !(device.package.capacityJPerK > 0)) {
    rangeFail(
      fieldPath(fieldPath(path, 'electrical'), 'thermalShutdown'),
      'needs heat capacity at the junction: give package.capacityJPerK, or a Foster or Cauer package model (without it the shutdown would cycle infinitely fast)',
    );
  }
  readPart(obj, path, device);
  return device;
}
