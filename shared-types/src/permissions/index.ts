export * from './abilities';
