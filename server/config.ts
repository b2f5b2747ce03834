export interface AppConfig {
  env: 'development' | 'test' | 'production';
  host: string;
  port: number;
  databaseUrl: string;
  sessionSecret: string;
  /** Express `trust proxy` setting: number of hops, or false */
  trustProxy: number | boolean;
  /** cookies marked Secure: 'auto' follows req.secure */
  secureCookies: boolean | 'auto';
  /** folder with the built client; served when present */
  clientDir: string | null;
  /** folder with the server-render bundle (Vite's dist/render): the Kitchen and the recipe book are drawn on the server when present */
  renderDir: string | null;
  /** request-per-window limits; tests raise or lower them */
  limits: RateLimitConfig;
  /** S3-compatible photo storage; null when none is configured */
  s3: S3Config | null;
}

export interface S3Config {
  endpoint: string | undefined;
  region: string;
  bucket: string;
  accessKeyId: string;
  secretAccessKey: string;
  forcePathStyle: boolean;
}

export function s3FromEnv(env: NodeJS.ProcessEnv): S3Config | null {
  if (!env.S3_BUCKET) return null;
  return {
    endpoint: env.S3_ENDPOINT || undefined,
    region: env.S3_REGION ?? 'us-east-1',
    bucket: env.S3_BUCKET,
    accessKeyId: env.S3_ACCESS_KEY_ID ?? '',
    secretAccessKey: env.S3_SECRET_ACCESS_KEY ?? '',
    forcePathStyle: env.S3_FORCE_PATH_STYLE !== 'false',
  };
}

export interface RateLimitConfig {
  /** failed sign-ins per account and address (or known browser) in 15 minutes */
  loginFailuresPer15Min: number;
  /** failed sign-ins per account from anywhere in a day; past it only known browsers may try */
  loginFailuresPerAccountPerDay: number;
  /** failed sign-ins per address across accounts in an hour; past it only known browsers may try */
  loginFailuresPerAddressPerHour: number;
  signupsPerHour: number;
  anonymousComputePerMin: number;
  userComputePerMin: number;
  /**
   * Counters are shared (in PostgreSQL) by every process with the same scope; tests give each app
   * its own scope so one test's requests do not count against another's.
   */
  scope: string;
  recipeImportsPerHour: number;
}

export const DEFAULT_SESSION_SECRET = 'hearthswap-development-secret-change-me';

export const DEFAULT_LIMITS: RateLimitConfig = {
  loginFailuresPer15Min: 10,
  loginFailuresPerAccountPerDay: 50,
  loginFailuresPerAddressPerHour: 100,
  signupsPerHour: 30,
  anonymousComputePerMin: 60,
  userComputePerMin: 600,
  scope: 'app',
  recipeImportsPerHour: 60,
};

function limitsFromEnv(env: NodeJS.ProcessEnv): RateLimitConfig {
  const positive = (value: string | undefined, fallback: number) => {
    const n = Number(value);
    return value && Number.isInteger(n) && n > 0 ? n : fallback;
  };
  return {
    ...DEFAULT_LIMITS,
    anonymousComputePerMin: positive(env.LIMIT_ANONYMOUS_COMPUTE_PER_MIN, DEFAULT_LIMITS.anonymousComputePerMin),
    userComputePerMin: positive(env.LIMIT_USER_COMPUTE_PER_MIN, DEFAULT_LIMITS.userComputePerMin),
  };
}

function parseTrustProxy(value: string | undefined): number | boolean {
  if (!value || value === 'false' || value === '0') return false;
  if (value === 'true') return true;
  const hops = Number(value);
  return Number.isInteger(hops) && hops > 0 ? hops : false;
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env, overrides: Partial<AppConfig> = {}): AppConfig {
  const nodeEnv = env.NODE_ENV === 'production' ? 'production' : env.NODE_ENV === 'test' ? 'test' : 'development';
  const config: AppConfig = {
    env: nodeEnv,
    host: env.HOST ?? '127.0.0.1',
    port: Number(env.PORT ?? 3000),
    databaseUrl: env.DATABASE_URL ?? '',
    sessionSecret: env.SESSION_SECRET ?? DEFAULT_SESSION_SECRET,
    trustProxy: parseTrustProxy(env.TRUST_PROXY),
    secureCookies: env.COOKIE_SECURE === 'true' ? true : env.COOKIE_SECURE === 'false' ? false : 'auto',
    clientDir: null,
    renderDir: null,
    limits: limitsFromEnv(env),
    s3: s3FromEnv(env),
    ...overrides,
  };
  if (config.env === 'production' && config.sessionSecret === DEFAULT_SESSION_SECRET) {
    throw new Error('SESSION_SECRET must be set to a long random value in production.');
  }
  if (config.env === 'production' && config.sessionSecret.length < 32) {
    throw new Error('SESSION_SECRET must be at least 32 characters in production.');
  }
  return config;
}

/**
 * Start-up warnings for a production server whose cookie settings look wrong for where it runs.
 * The app itself speaks plain HTTP, so in production TLS is terminated in front of it: unless
 * Express trusts that proxy (TRUST_PROXY) or the cookie is forced Secure (COOKIE_SECURE=true),
 * the session cookie goes out without its Secure flag.
 */
export function deploymentWarnings(config: AppConfig, env: NodeJS.ProcessEnv = process.env): string[] {
  if (config.env !== 'production') return [];
  const warnings: string[] = [];
  if (config.secureCookies === false) {
    warnings.push('COOKIE_SECURE=false: the session cookie will be sent over plain HTTP. Remove it, or set COOKIE_SECURE=true behind HTTPS.');
  } else if (config.secureCookies === 'auto' && config.trustProxy === false) {
    warnings.push(
      'TRUST_PROXY is not set, so behind a TLS-terminating proxy every request looks like plain HTTP and the session cookie loses its Secure flag. ' +
        'Set TRUST_PROXY to the number of proxies in front of Hearthswap (usually 1), or COOKIE_SECURE=true.',
    );
  }
  if (config.trustProxy === true) {
    warnings.push(
      'TRUST_PROXY=true trusts every X-Forwarded-For hop, so clients can choose the address rate limits see. Set the number of proxies instead (usually 1).',
    );
  }
  if (env.APP_URL && !env.APP_URL.startsWith('https://')) {
    warnings.push(`APP_URL is ${env.APP_URL}: links in e-mails will use plain HTTP. Give the public https:// address.`);
  }
  return warnings;
}
