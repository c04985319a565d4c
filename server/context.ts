import { Database } from './data-source';
import { ServerConfig } from './env';

/** What every router and service is built from; tests assemble their own. */
export interface AppContext {
  config: ServerConfig;
  db: Database;
  log: (message: string, detail?: unknown) => void;
}
