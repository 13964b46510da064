export * from './front-speed';
export * from './front-pieces';
export * from './viscous';
export * from './release';
export * from './flux';
