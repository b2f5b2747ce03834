import { describe, expect, it } from 'vitest';
import { deploymentWarnings, loadConfig } from '../../server/config';

const SECRET = 'x'.repeat(40);
const production = (env: Record<string, string>) => {
  const full = { NODE_ENV: 'production', SESSION_SECRET: SECRET, ...env };
  return deploymentWarnings(loadConfig(full), full);
};

describe('start-up warnings behind TLS termination', () => {
  it('warns in production when neither TRUST_PROXY nor COOKIE_SECURE makes the cookie Secure', () => {
    const warnings = production({ APP_URL: 'https://cook.example.test' });
    expect(warnings).toHaveLength(1);
    expect(warnings[0]).toMatch(/TRUST_PROXY/);
    expect(warnings[0]).toMatch(/COOKIE_SECURE=true/);
  });

  it('is quiet when the proxy is trusted by hop count or the cookie is forced Secure', () => {
    expect(production({ TRUST_PROXY: '1', APP_URL: 'https://cook.example.test' })).toEqual([]);
    expect(production({ COOKIE_SECURE: 'true', APP_URL: 'https://cook.example.test' })).toEqual([]);
  });

  it('warns about a cookie forced insecure, a proxy trusted blindly and plain-HTTP mail links', () => {
    expect(production({ TRUST_PROXY: '1', COOKIE_SECURE: 'false' }).join(' ')).toMatch(/COOKIE_SECURE=false/);
    expect(production({ TRUST_PROXY: 'true' }).join(' ')).toMatch(/number of proxies/);
    expect(production({ TRUST_PROXY: '1', APP_URL: 'http://cook.example.test' }).join(' ')).toMatch(/APP_URL/);
  });

  it('says nothing outside production, where plain HTTP on loopback is expected', () => {
    const env = { NODE_ENV: 'development' };
    expect(deploymentWarnings(loadConfig(env), env)).toEqual([]);
  });
});
