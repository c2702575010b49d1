import { describe, expect, it } from 'vitest';
import { ConfigError, loadConfig } from './config';

describe('configuration', () => {
  it('a bad environment stops start-up with every problem listed', () => {
    expect(() => loadConfig({ DATABASE_URL: 'mysql://x', SESSION_SECRET: 'short', PORT: 'eighty' })).toThrow(ConfigError);
    try {
      loadConfig({ DATABASE_URL: 'mysql://x', SESSION_SECRET: 'short', PORT: 'eighty' });
    } catch (error) {
      const message = (error as Error).message;
      expect(message).toContain('DATABASE_URL');
      expect(message).toContain('SESSION_SECRET');
      expect(message).toContain('PORT');
    }
  });

  it('a good environment gives defaults and the public address', () => {
    const config = loadConfig({ DATABASE_URL: 'postgres://u:p@127.0.0.1:5432/db', SESSION_SECRET: 'x'.repeat(32), BADGE_SECRET: 'b'.repeat(32), PORT: '3100', TRUST_PROXY: '1' });
    expect(config.PORT).toBe(3100);
    expect(config.publicUrl).toBe('http://127.0.0.1:3100');
    expect(config.trustProxy).toBe(1);
    expect(config.SMTP_URL).toBe('smtp://127.0.0.1:2525');
  });
});
