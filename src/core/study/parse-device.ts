import type { Device } from './types';
import { asObject, fieldPath, onlyKeys, readId, readNumber, readOptionalNumber, readOptionalString } from './field-reader';
import { parsePackage } from './parse-package';
import { parseElectrical } from './parse-electrical';

const DEVICE_KEYS = ['id', 'name', 'notes', 'tjMaxC', 'sink', 'count', 'package', 'interface', 'electrical'];

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
  return device;
}
