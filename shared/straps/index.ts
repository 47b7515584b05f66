export * from './strap-figures';
