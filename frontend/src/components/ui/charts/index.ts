export * from './chart-figure';
export * from './light-response-chart';
export * from './scales';
export * from './supply-range-chart';
