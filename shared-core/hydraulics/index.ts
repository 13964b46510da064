export * from './two-layer';
export * from './obstacle';
