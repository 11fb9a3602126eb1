export * from './enums';
export * from './shops';
export * from './users';
export * from './jobs';
export * from './parts';
export * from './stock';
export * from './plans';
export * from './recuts';
