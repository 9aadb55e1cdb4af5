export function fakesEnv(opts: {
  payments: { host: string; port: number };
  store: { env: Record<string, string> };
  secretKey: string;
  webhookSecret: string;
}): Record<string, string>;
export function startLocalServices(): Promise<{ env: Record<string, string>; stop: () => Promise<unknown> }>;
