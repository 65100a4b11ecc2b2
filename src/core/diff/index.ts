export { diffDocuments, describeChanges } from './diff-documents';
export type { FieldChange } from './diff-documents';
