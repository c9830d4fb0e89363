// Dieline parsing and geometry metrics: pure, no I/O.
export * from './units';
