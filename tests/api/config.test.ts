import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { ConfigError, readConfig } from '../../server/config';

describe('server settings from the environment', () => {
  it('defaults to port 3000 and ./data', () => {
    const config = readConfig({});
    expect(config.port).toBe(3000);
    expect(config.dataDir).toBe(path.resolve('data'));
    expect(config.databaseUrl).toBeUndefined();
  });

  it('keeps DATA_DIR=memory as the in-memory marker and treats empty variables as unset', () => {
    const config = readConfig({ DATA_DIR: 'memory', PORT: '', DATABASE_URL: '' });
    expect(config.dataDir).toBe('memory');
    expect(config.port).toBe(3000);
    expect(config.databaseUrl).toBeUndefined();
  });

  it.each([
    [{ PORT: 'eighty' }, 'PORT'],
    [{ PORT: '70000' }, 'PORT'],
    [{ DATABASE_URL: 'mysql://localhost/pinwork' }, 'DATABASE_URL'],
    [{ LOG_LEVEL: 'loud' }, 'LOG_LEVEL'],
  ])('refuses %o with a message naming %s', (env, name) => {
    expect(() => readConfig(env)).toThrow(ConfigError);
    expect(() => readConfig(env)).toThrow(new RegExp(`^Pinwork cannot start[^]*\\b${name}: `));
  });
});
