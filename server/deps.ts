import type { Config } from './config';
import type { Db } from './db';
import type { Mailer } from './mail/mailer';

/** What routes and services need from the outside world, built once by createApp. */
export type Deps = { db: Db; config: Config; mailer: Mailer };
