export * from './required-dilution';
export * from './boundary';
export * from './compliance';
export * from './far-field';
