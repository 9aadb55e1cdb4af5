export const FAKE_CARDS: { pays: string; declined: string };
export type FakeEvent = { event: { id: string; type: string; data: { object: Record<string, unknown> } }; payload: string; signature: string; target: string };
export function startFakeStripe(opts: {
  host?: string;
  port?: number;
  webhookSecret?: string;
  webhookUrl?: string;
  secretKey?: string;
  quiet?: boolean;
}): Promise<{ host: string; port: number; url: string; events: FakeEvent[]; sessions: Map<string, Record<string, unknown>>; stop: () => Promise<unknown> }>;
