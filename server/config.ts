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
    ...overrides,
  };
}
