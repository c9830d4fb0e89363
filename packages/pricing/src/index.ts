// Price history statistics, fair-price band and bid comparison: pure, no I/O.
export * from './money';
export * from './schedule';
export * from './compareBids';
