export * from './schema';
export * from './load';
export * from './assess';
export * from './context';
export { boundArgs } from './bindings';
