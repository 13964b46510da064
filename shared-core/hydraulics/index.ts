export * from './two-layer';
export * from './obstacle';
export * from './jump-finite-depth';
export * from './weir-withdrawal';
