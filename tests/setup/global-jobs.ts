// Starts the local payment fake and object store for the jobs tests and puts their settings into the
// environment, so the app server started after it (tests/setup/global-server.ts) reads them.
// Must run before global-server.ts in the same globalSetup list.
import { randomBytes } from "node:crypto";
import type { TestProject } from "vitest/node";
import { startFakeStripe } from "../../scripts/fake-stripe.mjs";
import { startObjectStore } from "../../scripts/object-store.mjs";
import { fakesEnv } from "../../scripts/services.mjs";

declare module "vitest" {
  export interface ProvidedContext {
    jobFakes: { stripeURL: string; webhookSecret: string; secretKey: string; s3: Record<string, string>; objectDir: string };
  }
}

export default async function setup(project: TestProject) {
  const webhookSecret = `whsec_${randomBytes(24).toString("hex")}`;
  const secretKey = `sk_test_${randomBytes(24).toString("hex")}`;
  const payments = await startFakeStripe({ port: 0, webhookSecret, secretKey, quiet: true });
  const store = await startObjectStore({ port: 0 });
  const env = fakesEnv({ payments, store, secretKey, webhookSecret });
  Object.assign(process.env, env);
  project.provide("jobFakes", { stripeURL: payments.url, webhookSecret, secretKey, s3: store.env, objectDir: store.directory });
  return async () => {
    await payments.stop();
    await store.stop();
  };
}
