import autocannon from 'autocannon';

/** p-th percentile of sorted values, nearest rank. */
const percentile = (sorted: number[], p: number) =>
  sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)] ?? NaN;

/**
 * Loads a URL with 50 connections for `seconds` after a short warm-up: requests a second and
 * latency percentiles. Errors count failures and 4xx/5xx answers (a 304 is an answer).
 */
export async function load(url: string, token: string, seconds: number, extraHeaders: Record<string, string> = {}) {
  const headers = { Authorization: `Bearer ${token}`, ...extraHeaders };
  // A short warm-up first (JIT, connection pools, caches), then the measured run.
  await autocannon({ url, connections: 50, duration: 2, headers });
  const latencies: number[] = [];
  const instance = autocannon({ url, connections: 50, duration: seconds, headers });
  instance.on('response', (_client: unknown, _status: number, _bytes: number, ms: number) => latencies.push(ms));
  const result = await instance;
  latencies.sort((a, b) => a - b);
  return {
    rps: result.requests.average,
    p50: percentile(latencies, 50),
    p95: percentile(latencies, 95),
    p99: percentile(latencies, 99),
    errors: result.errors + result['4xx'] + result['5xx'],
    notModified: result['3xx'],
  };
}
