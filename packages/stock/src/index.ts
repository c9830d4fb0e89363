// Stock weight, caliper, scoring advice and creasing guidance: pure, no I/O.
export * from './basisWeight';
export * from './caliper';
export * from './describeStockWeight';
export * from './guidanceNote';
export * from './stockKind';
export * from './steelRule';
export * from './scoringAdvice';
export * from './creasingGuidance';
