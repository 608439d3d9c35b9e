export * from './demo-catalog-ids';
export * from './demo-catalog';
export * from './demo-fit-selections';
