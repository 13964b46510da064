export * from './model';
export * from './charts';
export * from './format';
export { METHOD_CATALOGUE, methodsForSource } from './methods';
export * from './compliance';
export * from './verification';
export * from './inputs';
export * from './document';
