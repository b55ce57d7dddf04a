import { createHmac } from 'node:crypto';
import type { Config } from '../config';

/**
 * What the app signs in to the local mail catcher with: SMTP_USER / SMTP_PASSWORD when set,
 * otherwise a password derived from SESSION_SECRET, so only this installation's own server
 * (not any process on the machine) can file mail into its outbox.
 */
export function catcherCredentials(config: Pick<Config, 'SMTP_USER' | 'SMTP_PASSWORD' | 'SESSION_SECRET'>) {
  return {
    user: config.SMTP_USER ?? 'gelwright',
    pass: config.SMTP_PASSWORD ?? createHmac('sha256', config.SESSION_SECRET).update('gelwright mail catcher').digest('base64url'),
  };
}
