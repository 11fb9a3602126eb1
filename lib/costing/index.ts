export * from './money';
export * from './quote-totals';
export * from './labour';
