import { describe, expect, it } from 'vitest';
import { DEFAULT_SESSION_SECRET, loadConfig } from '../../server/config';

describe('configuration', () => {
  it('refuses to start in production with the default or a short session secret', () => {
    expect(() => loadConfig({ NODE_ENV: 'production', DATABASE_URL: 'postgres://x' })).toThrow(/SESSION_SECRET/);
    expect(() => loadConfig({ NODE_ENV: 'production', SESSION_SECRET: DEFAULT_SESSION_SECRET })).toThrow(/SESSION_SECRET/);
    expect(() => loadConfig({ NODE_ENV: 'production', SESSION_SECRET: 'short' })).toThrow(/32 characters/);
    expect(loadConfig({ NODE_ENV: 'production', SESSION_SECRET: 'x'.repeat(40) }).env).toBe('production');
  });

  it('listens on loopback by default and reads HOST, PORT and TRUST_PROXY', () => {
    const defaults = loadConfig({});
    expect(defaults).toMatchObject({ host: '127.0.0.1', port: 3000, trustProxy: false, s3: null });
    expect(loadConfig({ HOST: '0.0.0.0', PORT: '8080', TRUST_PROXY: '1' })).toMatchObject({ host: '0.0.0.0', port: 8080, trustProxy: 1 });
  });
});
