export * from './two-layer';
export * from './modes';
export * from './basin';
