export * from './salt-wedge';
export * from './richardson';
export * from './exchange';
export * from './lock';
export * from './exchange-net-flow';
export * from './exchange-sill-net-flow';
