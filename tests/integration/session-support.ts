// One account signed in on two devices, for the tests of what ends a session.
import { expect } from "vitest";
import { signIn, signUp, uniqueEmail } from "../support/http";

/** A new account signed up on one client (`here`) and signed in on a second (`elsewhere`), each answered as signed in. */
export async function twoSessions(name: string, tag: string, password: string) {
  const email = uniqueEmail(tag);
  const here = await signUp(name, email, password);
  const elsewhere = await signIn(email, password);
  for (const http of [here, elsewhere]) expect((await http.get("/api/v1/me")).status).toBe(200);
  return { email, here, elsewhere };
}
