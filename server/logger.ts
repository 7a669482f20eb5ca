import pino from 'pino';

import { config } from './config';

/** The one logger. Redacts anything that could carry a secret. */
export const logger = pino({
  level: config.logLevel,
  redact: {
    paths: ['req.headers.cookie', 'req.headers.authorization', 'res.headers["set-cookie"]', '*.password', '*.token'],
    censor: '[hidden]',
  },
});
