/** Server settings, read once from the environment and checked before anything starts. */
export interface Config {
  mode: 'demo' | 'production' | 'test';
  port: number;
  databaseUrl: string;
  publicBaseUrl: URL;
  sessionSecret: string;
  sessionHours: number;
  smtpUrl: string;
  mailFrom: string;
  trustProxy: string | number | boolean;
  /** Extra origins allowed to send mutating requests (the Vite dev server, for instance). */
  extraOrigins: string[];
  bcryptCost: number;
  clientDir: string | null;
  mailDir: string | null;
}

export class ConfigError extends Error {}

const MIN_SECRET_LENGTH = 32;

function parseTrustProxy(value: string | undefined): string | number | boolean {
  if (value === undefined || value === '' || value === 'false') return false;
  if (value === 'true') return true;
  if (/^\d+$/.test(value)) return Number(value);
  return value;
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const production = env.NODE_ENV === 'production';
  const mode: Config['mode'] = production ? 'production' : env.FERRULE_MODE === 'test' ? 'test' : 'demo';
  const missing: string[] = [];
  const need = (name: string): string => {
    const value = env[name]?.trim();
    if (!value) missing.push(name);
    return value ?? '';
  };

  const databaseUrl = need('DATABASE_URL');
  const smtpUrl = need('SMTP_URL');
  const publicBase = need('PUBLIC_BASE_URL');
  const sessionSecret = need('SESSION_SECRET');
  if (missing.length) {
    throw new ConfigError(`Ferrule cannot start: set ${missing.join(', ')} (see README, "Production mode").`);
  }
  if (production && env.FERRULE_DEMO === '1') {
    throw new ConfigError('Ferrule cannot start: FERRULE_DEMO is not allowed with NODE_ENV=production.');
  }
  if (sessionSecret.length < MIN_SECRET_LENGTH) {
    throw new ConfigError(`Ferrule cannot start: SESSION_SECRET must be at least ${MIN_SECRET_LENGTH} characters.`);
  }
  let publicBaseUrl: URL;
  try {
    publicBaseUrl = new URL(publicBase);
  } catch {
    throw new ConfigError('Ferrule cannot start: PUBLIC_BASE_URL must be an absolute URL such as https://hoses.example.org.');
  }
  if (!['http:', 'https:'].includes(publicBaseUrl.protocol)) {
    throw new ConfigError('Ferrule cannot start: PUBLIC_BASE_URL must start with http:// or https://.');
  }
  return {
    mode,
    port: Number(env.PORT ?? 3000),
    databaseUrl,
    publicBaseUrl,
    sessionSecret,
    sessionHours: Number(env.SESSION_HOURS ?? 12),
    smtpUrl,
    mailFrom: env.MAIL_FROM ?? `Ferrule <no-reply@${publicBaseUrl.hostname}>`,
    trustProxy: parseTrustProxy(env.TRUST_PROXY),
    extraOrigins: (env.EXTRA_ORIGINS ?? '').split(',').map((s) => s.trim()).filter(Boolean),
    bcryptCost: Number(env.BCRYPT_COST ?? (mode === 'test' ? 4 : 12)),
    clientDir: env.CLIENT_DIR ?? null,
    mailDir: env.MAIL_DIR ?? null,
  };
}
