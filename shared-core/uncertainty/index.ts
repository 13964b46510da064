export * from './sampling';
export * from './propagate';
export * from './parse';
export * from './typed';
