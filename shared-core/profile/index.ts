export * from './profile';
export * from './stratification';
export * from './csv';
export * from './casts';
