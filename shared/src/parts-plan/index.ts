export * from './attribute-words';
export * from './counter-words';
export * from './part-categories';
export * from './part-attributes';
export * from './plan-types';
export * from './plan-model';
export * from './plan-parts';
export * from './fabrication-operations';
