/** The two team catalogues, by their API path under /api. */
export type CatalogueResource = 'heatsinks' | 'interface-materials';

/** A field the import can fill, as `POST /api/<catalogue>/import/preview` lists it. */
export type ImportField = {
  field: string;
  label: string;
  kind: 'text' | 'quantity' | 'integer' | 'number' | 'choice';
  units?: string[];
  defaultUnit?: string;
};

export type FieldMapping = { column: string; unit?: string };
export type ForcedAirColumn = { column: string; airSpeedMPerS: number };

/** Which column feeds which field (and its unit); heatsinks add forced-air columns. */
export type ImportMapping = { fields: Record<string, FieldMapping>; forcedAir: ForcedAirColumn[] };

export type ImportPreview = {
  columns: string[];
  delimiter: string;
  rowCount: number;
  firstRows: string[][];
  suggestedMapping: Record<string, unknown>;
  fields: ImportField[];
};

/** One problem of a refused import (`400 import_failed`), with the spreadsheet row number. */
export type ImportRowError = { row: number; column: string; message: string };

/** A file chosen for upload. */
export type PickedFile = { name: string; size: number; blob: Blob };
