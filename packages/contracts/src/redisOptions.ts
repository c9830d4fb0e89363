/** The connection options ioredis (and BullMQ through it) takes, as read from a Redis URL. */
export interface RedisConnectionOptions {
  host: string;
  port: number;
  username?: string;
  password?: string;
  db: number;
  tls?: { servername: string };
}

/**
 * Reads the whole of a `redis://` or `rediss://` URL: user, password, TLS, database number.
 * Hosted Redis needs all of them; BullMQ connections built from host and port alone answer NOAUTH.
 * Throws an Error saying what is wrong (never echoing the URL, which may hold a password).
 */
export function redisOptions(redisUrl: string): RedisConnectionOptions {
  let url: URL;
  try {
    url = new URL(redisUrl);
  } catch {
    throw new Error('is not a URL (redis://[user:password@]host[:port][/db])');
  }
  if (url.protocol !== 'redis:' && url.protocol !== 'rediss:') throw new Error('must start with redis:// or rediss://');
  if (!url.hostname) throw new Error('has no host');
  const path = url.pathname.replace(/^\//, '');
  if (!/^\d*$/.test(path)) throw new Error('has a database that is not a number (redis://host:port/0)');
  // WHATWG URLs keep IPv6 hosts in brackets; sockets want the bare address.
  const host = url.hostname.replace(/^\[(.*)\]$/, '$1');
  return {
    host,
    port: url.port ? Number(url.port) : 6379,
    ...(url.username ? { username: decodeURIComponent(url.username) } : {}),
    ...(url.password ? { password: decodeURIComponent(url.password) } : {}),
    db: path ? Number(path) : 0,
    ...(url.protocol === 'rediss:' ? { tls: { servername: host } } : {}),
  };
}
