// Price history statistics, fair-price band and bid comparison: pure, no I/O.
export * from './money';
export * from './awardReason';
export * from './schedule';
export * from './compareBids';
export * from './notEnough';
export * from './observations';
export * from './regression';
export * from './tQuantile';
export * from './priceFit';
export * from './fairPriceBand';
export * from './pricePerInch';
export * from './priceTrend';
export * from './rateCard';
export * from './calibrateCard';
export * from './paymentTerms';
export * from './invoiceMatch';
