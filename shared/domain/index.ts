// Larderly's domain core: pure computation shared by the client and the server.
export * from './units';
export * from './kitchen-amounts';
export * from './scaling';
export * from './processing-tables';
export * from './processing';
export * from './cautions';
export * from './products';
export * from './dates';
export * from './shelf-life';
export * from './ids';
export * from './allocation';
export * from './forecast';
export * from './restock';
export * from './jar-size-advice';
export * from './validate';
export * from './plan-waste';
export * from './meal-proposal';
