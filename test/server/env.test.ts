import { readConfig } from '../../server/env';

describe('reading the environment', () => {
  test('secure cookies follow the public address unless set outright', () => {
    expect(readConfig({}).secureCookies).toBe(false);
    expect(readConfig({ NODE_ENV: 'production', SAGWRIGHT_PUBLIC_URL: 'http://192.168.1.20:8080' }).secureCookies).toBe(false);
    expect(readConfig({ NODE_ENV: 'production', SAGWRIGHT_PUBLIC_URL: 'https://shop.example.test' }).secureCookies).toBe(true);
    expect(readConfig({ SAGWRIGHT_SECURE_COOKIES: '1' }).secureCookies).toBe(true);
    expect(readConfig({ SAGWRIGHT_SECURE_COOKIES: '0', SAGWRIGHT_PUBLIC_URL: 'https://shop.example.test' }).secureCookies).toBe(false);
  });

  test('CORS is closed in production and open to the dev server otherwise', () => {
    expect(readConfig({ NODE_ENV: 'production' }).corsOrigins).toEqual([]);
    expect(readConfig({}).corsOrigins).toEqual(['http://localhost:8081']);
  });

  test('a bad port is refused with a clear message', () => {
    expect(() => readConfig({ PORT: 'eighty' })).toThrow(/PORT must be a whole number/);
    expect(readConfig({ PORT: '9000' }).port).toBe(9000);
    expect(readConfig({}).port).toBe(8080);
  });
});
