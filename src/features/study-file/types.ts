/** A file the user picked, read only on demand (its size is checked first). */
export type PickedStudyFile = { name: string; size: number; read: () => Promise<string> };
