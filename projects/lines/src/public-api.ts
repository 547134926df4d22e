export * from './types';
export * from './errors';
export * from './transient/index';
export * from './field/index';
