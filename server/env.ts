/**
 * The one module that reads process.env. Everything else receives a ServerConfig.
 */
import path from 'node:path';

export interface ServerConfig {
  port: number;
  dataDir: string;
  webDir: string;
  production: boolean;
  seedDemo: boolean;
  version: string;
  /** Origins allowed to call the API from another origin (the Expo dev server); empty closes CORS. */
  corsOrigins: string[];
}

const root = path.resolve(__dirname, '..');

function readPort(raw: string | undefined): number {
  if (raw === undefined || raw === '') return 8080;
  const port = Number(raw);
  if (!Number.isInteger(port) || port < 0 || port > 65535) {
    throw new Error(`PORT must be a whole number from 0 to 65535, not "${raw}"`);
  }
  return port;
}

export function readConfig(env: NodeJS.ProcessEnv = process.env): ServerConfig {
  const production = env.NODE_ENV === 'production';
  return {
    port: readPort(env.PORT),
    dataDir: path.resolve(env.DATA_DIR ?? path.join(root, 'data')),
    webDir: path.resolve(env.WEB_DIR ?? path.join(root, 'dist')),
    production,
    seedDemo: env.SAGWRIGHT_DEMO !== '0',
    version: env.npm_package_version ?? require('../package.json').version,
    corsOrigins: production
      ? []
      : (env.SAGWRIGHT_DEV_ORIGINS ?? 'http://localhost:8081').split(',').map((o) => o.trim()).filter(Boolean),
  };
}
