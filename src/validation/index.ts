export * from './auth';
export * from './studies';
