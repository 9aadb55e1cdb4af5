import type { ChildProcess } from "node:child_process";
export const root: string;
export function ensureSecret(): void;
export function ensureSecrets(envFile?: string): void;
export function run(cmd: string, args: string[], env?: Record<string, string>): void;
export function freePort(): Promise<number>;
export function waitFor(url: string, timeoutMs?: number, child?: ChildProcess): Promise<void>;
export function startNext(opts: { port: number; host?: string; env?: Record<string, string>; quiet?: boolean }): ChildProcess & { log?: () => string };
export function buildIsStale(): boolean;
