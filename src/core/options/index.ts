export * from './kinds';
export * from './length';
export * from './schema';
export * from './resolve';
