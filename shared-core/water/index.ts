export * from './fresh-density';
export * from './eos80';
export * from './teos10';
export * from './sediment';
export * from './transport';
export * from './buoyancy';
export * from './density';
export * from './salinity';
