import path from 'node:path';

export interface ServerConfig {
  port: number;
  publicUrl: string;
  dataDir: string;
  jwtSecret: string;
  /** Token lifetime in seconds; at most one 12-hour shift. */
  tokenTtlSeconds: number;
  /** Sign-in attempts allowed per address and e-mail within the window. */
  loginRateLimit: { max: number; windowMs: number };
  webDir: string | null;
  bcryptCost: number;
  /** Where photos are kept: `local` under dataDir/photos, or an S3-compatible bucket. */
  storage: StorageConfig;
  /** Outgoing e-mail over SMTP (a local maildev in development and tests). */
  mail: MailConfig;
}

export interface MailConfig {
  host: string;
  port: number;
  secure: boolean;
  user: string | undefined;
  pass: string | undefined;
  from: string;
  /** The local fake mail server's web inbox (development only). */
  maildevWebPort: number;
  /** How often the outbox worker looks for mail to send, in milliseconds. */
  pollMs: number;
}

/** SMTP_HOST, SMTP_PORT, SMTP_SECURE, SMTP_USER, SMTP_PASS, MAIL_FROM, MAILDEV_WEB_PORT. */
export function readMailConfig(env: Record<string, string | undefined>): MailConfig {
  return {
    host: env.SMTP_HOST || '127.0.0.1',
    port: Number(env.SMTP_PORT || 1025),
    secure: (env.SMTP_SECURE ?? 'false').toLowerCase() === 'true',
    user: env.SMTP_USER || undefined,
    pass: env.SMTP_PASS || undefined,
    from: env.MAIL_FROM || 'Isoledger <no-reply@isoledger.example>',
    maildevWebPort: Number(env.MAILDEV_WEB_PORT || 1080),
    pollMs: Number(env.MAIL_POLL_MS || 5000),
  };
}

export type StorageConfig =
  | { driver: 'local' }
  | {
      driver: 's3';
      endpoint: string | undefined;
      bucket: string;
      region: string;
      accessKeyId: string | undefined;
      secretAccessKey: string | undefined;
      /** Path-style URLs (endpoint/bucket/key), which most self-hosted S3-compatible services need. */
      forcePathStyle: boolean;
    };

/** STORAGE_DRIVER=local (default) or s3 with S3_ENDPOINT, S3_BUCKET, S3_REGION, S3_ACCESS_KEY_ID, S3_SECRET_ACCESS_KEY, S3_FORCE_PATH_STYLE. */
export function readStorageConfig(env: Record<string, string | undefined>): StorageConfig {
  const driver = (env.STORAGE_DRIVER ?? 'local').trim().toLowerCase();
  if (driver === 'local' || driver === '') return { driver: 'local' };
  if (driver !== 's3') throw new Error(`STORAGE_DRIVER must be "local" or "s3", not "${driver}"`);
  if (!env.S3_BUCKET) throw new Error('STORAGE_DRIVER=s3 needs S3_BUCKET');
  return {
    driver: 's3',
    endpoint: env.S3_ENDPOINT || undefined,
    bucket: env.S3_BUCKET,
    region: env.S3_REGION || 'us-east-1',
    accessKeyId: env.S3_ACCESS_KEY_ID || undefined,
    secretAccessKey: env.S3_SECRET_ACCESS_KEY || undefined,
    forcePathStyle: (env.S3_FORCE_PATH_STYLE ?? 'true').toLowerCase() !== 'false',
  };
}

export function readConfig(env: Record<string, string | undefined> = process.env, overrides: Partial<ServerConfig> = {}): ServerConfig {
  const port = Number(env.PORT ?? 8080);
  const dataDir = path.resolve(env.DATA_DIR ?? '.data');
  return {
    port,
    publicUrl: (env.PUBLIC_URL ?? `http://127.0.0.1:${port}`).replace(/\/+$/, ''),
    dataDir,
    jwtSecret: env.JWT_SECRET ?? '',
    tokenTtlSeconds: 12 * 60 * 60,
    loginRateLimit: { max: Number(env.LOGIN_RATE_LIMIT ?? 10), windowMs: 15 * 60 * 1000 },
    webDir: path.resolve('dist'),
    bcryptCost: 12,
    storage: readStorageConfig(env),
    mail: readMailConfig(env),
    ...overrides,
  };
}

/** HS256 wants a key at least as long as its 256-bit output (RFC 7518 §3.2). */
export const MIN_JWT_SECRET_BYTES = 32;

/** Refuses a configuration the server must not run with; called before anything starts. */
export function assertStartable(config: ServerConfig): void {
  const bytes = Buffer.byteLength(config.jwtSecret, 'utf8');
  if (bytes < MIN_JWT_SECRET_BYTES) {
    throw new Error(`JWT_SECRET must be at least ${MIN_JWT_SECRET_BYTES} bytes (it is ${bytes}). Generate one with: openssl rand -base64 48`);
  }
}
