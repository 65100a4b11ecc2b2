export * from './auth';
export * from './studies';
export * from './team';
export * from './catalogues';
export * from './parts';
export * from './tolerance';
export * from './team-settings';
