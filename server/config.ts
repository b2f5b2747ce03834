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
  loginFailuresPer15Min: number;
  signupsPerHour: number;
  anonymousComputePerMin: number;
  userComputePerMin: number;
  recipeImportsPerHour: number;
}

export const DEFAULT_SESSION_SECRET = 'hearthswap-development-secret-change-me';

export const DEFAULT_LIMITS: RateLimitConfig = {
  loginFailuresPer15Min: 10,
  signupsPerHour: 30,
  anonymousComputePerMin: 60,
  userComputePerMin: 600,
  recipeImportsPerHour: 60,
};

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
    limits: { ...DEFAULT_LIMITS },
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
