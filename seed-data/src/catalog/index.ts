export * from './demo-catalog-ids';
export * from './demo-catalog';
export * from './demo-fit-selections';
export * from './demo-parts';
