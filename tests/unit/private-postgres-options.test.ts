import { describe, expect, it } from 'vitest';
import { serverOptions } from '../../scripts/postgres';

const UNSAFE = [/fsync\s*=\s*off/, /full_page_writes\s*=\s*off/, /synchronous_commit\s*=\s*off/];

describe('private PostgreSQL server options', () => {
  it('keeps durability on for the cluster npm start runs', () => {
    const options = serverOptions({ port: 54329, socketDir: '/tmp/s', durable: true }).join(' ');
    for (const unsafe of UNSAFE) expect(options).not.toMatch(unsafe);
    expect(options).toContain('-p 54329');
    expect(options).toContain('listen_addresses=127.0.0.1');
  });

  it('lets a throw-away test cluster trade durability for speed', () => {
    const options = serverOptions({ port: 54330, socketDir: '/tmp/s', durable: false }).join(' ');
    for (const unsafe of UNSAFE) expect(options).toMatch(unsafe);
    expect(options).toContain('listen_addresses=127.0.0.1');
  });
});
