export type SinkMessage = { id: string; from: string; to: string[]; subject: string; text: string; html: string; links: string[]; receivedAt: string };
export function startMailSink(opts?: { host?: string; smtpPort?: number; httpPort?: number; quiet?: boolean }): Promise<{
  host: string;
  smtpPort: number;
  httpPort: number;
  url: string;
  stop: () => Promise<unknown>;
}>;
