import { createAccessControl } from "better-auth/plugins/access";
import { defaultStatements } from "better-auth/plugins/organization/access";

/** The three roles a member of a shop can hold. */
export const ROLES = ["owner", "builder", "customer"] as const;
export type Role = (typeof ROLES)[number];

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

/** Roles that work on the shop's own data (library, studies, jobs). */
export const SHOP_STAFF: readonly Role[] = ["owner", "builder"];

const statements = {
  ...defaultStatements,
  library: ["read", "write"],
  study: ["read", "write"],
  job: ["read", "write", "share"],
  settings: ["read", "write"],
  money: ["read", "write"],
} as const;

export const accessControl = createAccessControl(statements);

export const roles = {
  owner: accessControl.newRole({
    organization: ["update", "delete"],
    member: ["create", "update", "delete"],
    invitation: ["create", "cancel"],
    team: [],
    ac: ["read"],
    library: ["read", "write"],
    study: ["read", "write"],
    job: ["read", "write", "share"],
    settings: ["read", "write"],
    money: ["read", "write"],
  }),
  builder: accessControl.newRole({
    organization: [],
    member: [],
    invitation: [],
    team: [],
    ac: ["read"],
    library: ["read", "write"],
    study: ["read", "write"],
    job: ["read", "write", "share"],
    settings: ["read"],
    money: [],
  }),
  customer: accessControl.newRole({
    organization: [],
    member: [],
    invitation: [],
    team: [],
    ac: [],
    library: [],
    study: [],
    job: [],
    settings: [],
    money: [],
  }),
};
