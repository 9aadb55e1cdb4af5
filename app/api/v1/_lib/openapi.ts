// The OpenAPI 3.1 description of the library and studies API, generated from the same zod schemas that
// parse the requests, so the description cannot drift from what the handlers accept.
import { z } from "zod";
import {
  CaseCreateSchema,
  CasePatchSchema,
  CaseRowSchema,
  CsvImportResultSchema,
  CsvImportSchema,
  ErrorSchema,
  HistoryItemSchema,
  KitCreateSchema,
  KitPatchSchema,
  KitRowSchema,
  LibraryKindQuerySchema,
  RigCreateSchema,
  RigPatchSchema,
  RigRowSchema,
  SettingsPatchSchema,
  SettingsSchema,
  StudyCreateSchema,
  StudyPatchSchema,
  StudyResultSchema,
  StudyRowSchema,
  StudySchema,
  listQuerySchema,
  pageSchema,
  type Entity,
} from "@/model/schemas";

type Method = "get" | "post" | "patch" | "delete";
type Operation = {
  method: Method;
  path: string;
  summary: string;
  /** Who may call it; anyone else gets 401 (signed out) or 403 (another role). */
  roles: "staff" | "owner" | "member" | "public";
  query?: z.ZodObject;
  body?: z.ZodType;
  ok: { status: number; schema?: z.ZodType; contentType?: string; description: string };
  errors: number[];
};

const item = (s: z.ZodType) => z.object({ item: s });
const ROWS: Record<Entity, z.ZodType> = { cases: CaseRowSchema, kits: KitRowSchema, rigs: RigRowSchema, studies: StudyRowSchema };
const WORDS: Record<Entity, string> = { cases: "case profile", kits: "cylinder kit", rigs: "boring rig", studies: "study" };
const CREATE: Record<Exclude<Entity, "studies">, z.ZodType> = { cases: CaseCreateSchema, kits: KitCreateSchema, rigs: RigCreateSchema };
const PATCH: Record<Exclude<Entity, "studies">, z.ZodType> = { cases: CasePatchSchema, kits: KitPatchSchema, rigs: RigPatchSchema };

function libraryOperations(e: Exclude<Entity, "studies">): Operation[] {
  const base = `/api/v1/${e}`;
  const w = WORDS[e];
  return [
    { method: "get", path: base, summary: `A page of the shop's ${w}s`, roles: "staff", query: listQuerySchema(e), ok: { status: 200, schema: pageSchema(ROWS[e]), description: "One page" }, errors: [400, 401, 403] },
    { method: "post", path: base, summary: `Adds a ${w}`, roles: "staff", body: CREATE[e], ok: { status: 201, schema: item(ROWS[e]), description: "Created" }, errors: [400, 401, 403, 413] },
    { method: "get", path: `${base}/{id}`, summary: `One ${w}`, roles: "staff", ok: { status: 200, schema: item(ROWS[e]), description: "The row" }, errors: [401, 403, 404] },
    { method: "patch", path: `${base}/{id}`, summary: `Changes a ${w}; the body names the version it was read at`, roles: "staff", body: PATCH[e], ok: { status: 200, schema: item(ROWS[e]), description: "Changed (version incremented)" }, errors: [400, 401, 403, 404, 409, 413] },
    { method: "delete", path: `${base}/{id}`, summary: `Deletes a ${w} that no study uses (409 naming the studies otherwise)`, roles: "staff", ok: { status: 204, description: "Deleted" }, errors: [401, 403, 404, 409] },
    { method: "post", path: `${base}/{id}/archive`, summary: `Archives a ${w}`, roles: "staff", ok: { status: 200, schema: item(ROWS[e]), description: "Archived" }, errors: [401, 403, 404] },
    { method: "post", path: `${base}/{id}/restore`, summary: `Restores an archived ${w}`, roles: "staff", ok: { status: 200, schema: item(ROWS[e]), description: "Restored" }, errors: [401, 403, 404] },
  ];
}

const csvKind = LibraryKindQuerySchema;

/** Every operation of the library and studies API. */
export const OPERATIONS: Operation[] = [
  ...libraryOperations("cases"),
  ...libraryOperations("kits"),
  ...libraryOperations("rigs"),
  { method: "get", path: "/api/v1/studies", summary: "A page of the shop's studies", roles: "staff", query: listQuerySchema("studies"), ok: { status: 200, schema: pageSchema(StudyRowSchema), description: "One page" }, errors: [400, 401, 403] },
  { method: "post", path: "/api/v1/studies", summary: "Creates a study from the shop's library", roles: "staff", body: StudyCreateSchema, ok: { status: 201, schema: item(StudyRowSchema), description: "Created" }, errors: [400, 401, 403, 413] },
  { method: "get", path: "/api/v1/studies/{id}", summary: "A study's row and the assembled Study the core evaluates", roles: "staff", ok: { status: 200, schema: z.object({ item: StudyRowSchema, study: StudySchema }), description: "The study" }, errors: [401, 403, 404] },
  { method: "patch", path: "/api/v1/studies/{id}", summary: "Changes a study; the body names the version it was read at", roles: "staff", body: StudyPatchSchema, ok: { status: 200, schema: item(StudyRowSchema), description: "Changed (version incremented)" }, errors: [400, 401, 403, 404, 409, 413] },
  { method: "post", path: "/api/v1/studies/{id}/archive", summary: "Archives a study (studies are never deleted)", roles: "staff", ok: { status: 200, schema: item(StudyRowSchema), description: "Archived" }, errors: [401, 403, 404] },
  { method: "post", path: "/api/v1/studies/{id}/restore", summary: "Restores an archived study", roles: "staff", ok: { status: 200, schema: item(StudyRowSchema), description: "Restored" }, errors: [401, 403, 404] },
  { method: "post", path: "/api/v1/studies/{id}/duplicate", summary: 'Copies a study as "… (copy)"', roles: "staff", ok: { status: 201, schema: item(StudyRowSchema), description: "The copy" }, errors: [401, 403, 404] },
  { method: "get", path: "/api/v1/studies/{id}/results", summary: "The stored study evaluated by the core", roles: "staff", ok: { status: 200, schema: z.object({ study: StudySchema, result: StudyResultSchema }), description: "The results" }, errors: [401, 403, 404, 422] },
  { method: "get", path: "/api/v1/studies/{id}/history", summary: "Who changed what in the study, newest first", roles: "staff", ok: { status: 200, schema: z.object({ items: z.array(HistoryItemSchema) }), description: "The history" }, errors: [401, 403, 404] },
  { method: "get", path: "/api/v1/studies/{id}/export", summary: "The study as a file, in the format `npm run fit` reads", roles: "staff", ok: { status: 200, schema: StudySchema, description: "The study file (an attachment)" }, errors: [401, 403, 404, 422] },
  { method: "post", path: "/api/v1/studies/import", summary: "Creates a study from a study file; its case, kits and rig become new library rows", roles: "staff", body: StudySchema, ok: { status: 201, schema: item(StudyRowSchema), description: "Imported" }, errors: [400, 401, 403, 413] },
  { method: "get", path: "/api/v1/library/template", summary: "A CSV template for case profiles or kits", roles: "staff", query: csvKind, ok: { status: 200, contentType: "text/csv", description: "The template" }, errors: [400, 401, 403] },
  { method: "get", path: "/api/v1/library/export", summary: "The shop's case profiles or kits as CSV", roles: "staff", query: csvKind, ok: { status: 200, contentType: "text/csv", description: "The CSV" }, errors: [400, 401, 403] },
  { method: "post", path: "/api/v1/library/import", summary: "Checks each row of a CSV; with confirm, writes the good rows", roles: "staff", query: csvKind, body: CsvImportSchema, ok: { status: 200, schema: CsvImportResultSchema, description: "A report per row" }, errors: [400, 401, 403, 413] },
  { method: "get", path: "/api/v1/settings", summary: "The shop's units and limits", roles: "staff", ok: { status: 200, schema: SettingsSchema, description: "The settings" }, errors: [401, 403] },
  { method: "patch", path: "/api/v1/settings", summary: "Changes the shop's units or limits (owner only)", roles: "owner", body: SettingsPatchSchema, ok: { status: 200, schema: SettingsSchema, description: "Changed" }, errors: [400, 401, 403, 409, 413] },
  { method: "post", path: "/api/v1/fit", summary: "Evaluates a study sent in the body", roles: "member", body: StudySchema, ok: { status: 200, schema: z.object({ result: StudyResultSchema }), description: "The results" }, errors: [400, 401, 413, 422] },
  { method: "get", path: "/api/v1/openapi.json", summary: "This description", roles: "public", ok: { status: 200, description: "OpenAPI 3.1" }, errors: [] },
];

const ERROR_TEXT: Record<number, string> = {
  400: "Bad input: each bad field is named in error.fields",
  401: "Not signed in",
  403: "The caller's role does not allow this",
  404: "No such row in the caller's shop (also for another shop's row)",
  409: "Someone else changed it (stale version), or it is still in use",
  413: "The body is too large",
  422: "The stored study cannot be evaluated as it stands",
};

const ROLE_TEXT: Record<Operation["roles"], string> = {
  staff: "Owner or builder of the active shop.",
  owner: "Owner of the active shop.",
  member: "Any signed-in member of a shop.",
  public: "Anyone.",
};

function jsonSchema(schema: z.ZodType, io: "input" | "output") {
  const out = z.toJSONSchema(schema, { io, unrepresentable: "any" }) as Record<string, unknown>;
  delete out.$schema;
  return out;
}

/** The whole OpenAPI document. */
export function openApiDocument() {
  const paths: Record<string, Record<string, unknown>> = {};
  for (const op of OPERATIONS) {
    const parameters: unknown[] = [];
    if (op.path.includes("{id}")) parameters.push({ name: "id", in: "path", required: true, schema: { type: "string" } });
    if (op.query) {
      for (const [name, s] of Object.entries(op.query.shape)) {
        const schema = s as z.ZodType;
        parameters.push({ name, in: "query", required: !schema.safeParse(undefined).success, schema: jsonSchema(schema, "output") });
      }
    }
    const responses: Record<string, unknown> = {
      [String(op.ok.status)]: {
        description: op.ok.description,
        ...(op.ok.schema ? { content: { "application/json": { schema: jsonSchema(op.ok.schema, "output") } } } : {}),
        ...(op.ok.contentType ? { content: { [op.ok.contentType]: { schema: { type: "string" } } } } : {}),
      },
    };
    for (const status of op.errors) {
      responses[String(status)] = { description: ERROR_TEXT[status], content: { "application/json": { schema: { $ref: "#/components/schemas/Error" } } } };
    }
    paths[op.path] ??= {};
    paths[op.path][op.method] = {
      summary: op.summary,
      description: `Who may call it: ${ROLE_TEXT[op.roles]}`,
      ...(op.roles === "public" ? { security: [] } : {}),
      ...(parameters.length ? { parameters } : {}),
      ...(op.body ? { requestBody: { required: true, content: { "application/json": { schema: jsonSchema(op.body, "input") } } } } : {}),
      responses,
    };
  }
  return {
    openapi: "3.1.0",
    info: {
      title: "Borewright library and studies API",
      version: "1",
      description:
        "Case profiles, cylinder kits, boring rigs and studies of the caller's active shop. Lengths are in millimetres. " +
        "Every error answers { error: { code, message, fields? } }. Updates name the version they were read at.",
    },
    servers: [{ url: "/" }],
    components: {
      securitySchemes: { session: { type: "apiKey", in: "cookie", name: "borewright.session_token" } },
      schemas: { Error: jsonSchema(ErrorSchema, "output") },
    },
    security: [{ session: [] }],
    paths,
  };
}
