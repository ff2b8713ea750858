import type { Sequelize } from 'sequelize';
import type { Config } from './config';
import type { Logger } from './http/logging';
import type { ReadCache } from './http/read-cache';
import type { Mailer } from './services/mail/mailer';
import type { PhotoStorage } from './services/photo-storage';
import type { PushSender } from './services/push/push-sender';

/** What every router and service may need, built once per app. */
export interface AppContext {
  config: Config;
  sequelize: Sequelize;
  /** SMTP: the local catcher in development and tests */
  mailer: Mailer;
  /** Web Push with the VAPID keys */
  push: PushSender;
  /** batch photos: the object store, or the local disk on a single machine */
  photos: PhotoStorage;
  /** This process's household answers, kept until the household's data changes */
  readCache: ReadCache;
  /** the process's JSON logger (absent in the one-off scripts, which print plain lines) */
  log?: Logger;
}
