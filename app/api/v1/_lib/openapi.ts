// The one list of the API's routes, and the OpenAPI 3.1 description generated from it with the same zod
// schemas that parse the requests. The authorization matrix test reads the same list and fails when a
// route module exists that is not in it (or the other way round), so no route goes undocumented.
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
  JobCreateSchema,
  JobListQuerySchema,
  JobMoveSchema,
  JobPatchSchema,
  PhotoPatchSchema,
  PhotoRequestSchema,
  QuestionSchema,
  ReadingsBodySchema,
} from "@/model/schemas";
import { ApproveSchema, QuotePutSchema } from "@/model/quote";
import { CasePhotoPatchSchema, CasePhotoRequestSchema } from "@/model/schemas/case-photos";
import { CheckoutSchema, MePatchSchema, MeSchema, NewShopSchema, ShopsSchema } from "./account-schemas";

type Method = "get" | "post" | "put" | "patch" | "delete";
export type Operation = {
  method: Method;
  path: string;
  summary: string;
  /** Who may call it; anyone else gets 401 (signed out) or 403 (another role). */
  roles: "staff" | "owner" | "member" | "customer" | "job" | "public" | "signed";
  query?: z.ZodObject;
  body?: z.ZodType;
  ok: { status: number; schema?: z.ZodType; contentType?: string; description: string };
  errors: number[];
};

const item = (s: z.ZodType) => z.object({ item: s });
/** An answer whose shape the description does not spell out. */
const anyObject = z.object({}).passthrough();
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
  ...casePhotoOperations(),
  ...accountOperations(),
  ...jobOperations(),
];

/** Routes under app/api that are not ours to describe: the sign-in library's own endpoints. */
export const LIBRARY_ROUTES = [
  { method: "get", path: "/api/auth/{...all}" },
  { method: "post", path: "/api/auth/{...all}" },
] as const;

function casePhotoOperations(): Operation[] {
  const photos = "/api/v1/cases/{id}/photos";
  return [
    { method: "get", path: photos, summary: "The case profile's deck photos with short-lived download addresses, newest first", roles: "staff", ok: { status: 200, schema: anyObject, description: "The photos" }, errors: [401, 403, 404] },
    { method: "post", path: photos, summary: "Asks for an upload address for a new deck photo", roles: "staff", body: CasePhotoRequestSchema, ok: { status: 201, schema: anyObject, description: "Where to upload" }, errors: [400, 401, 403, 404, 415, 503] },
    { method: "get", path: `${photos}/{photoId}`, summary: "Redirects to a short-lived address of the photo", roles: "staff", ok: { status: 303, description: "To the photo" }, errors: [401, 403, 404] },
    { method: "patch", path: `${photos}/{photoId}`, summary: "Sets or clears the photo's reference points (two points and a distance, or a measured rectangle)", roles: "staff", body: CasePhotoPatchSchema, ok: { status: 200, schema: anyObject, description: "The photo" }, errors: [400, 401, 403, 404, 422] },
    { method: "delete", path: `${photos}/{photoId}`, summary: "Removes the photo and its file", roles: "staff", ok: { status: 204, description: "Removed" }, errors: [401, 403, 404] },
    { method: "post", path: `${photos}/{photoId}/complete`, summary: "Checks the uploaded file (its type by its bytes, its size) and keeps it", roles: "staff", ok: { status: 200, schema: anyObject, description: "Kept" }, errors: [401, 403, 404, 409, 415] },
  ];
}

function accountOperations(): Operation[] {
  return [
    { method: "get", path: "/api/v1/me", summary: "The caller: who, which shop, which role, which units", roles: "member", ok: { status: 200, schema: MeSchema, description: "The caller" }, errors: [401] },
    { method: "post", path: "/api/v1/me", summary: "Changes the caller's own preferences (units)", roles: "member", body: MePatchSchema, ok: { status: 200, schema: MeSchema, description: "Changed" }, errors: [400, 401, 403, 413, 415] },
    { method: "get", path: "/api/v1/shops", summary: "The shops the caller belongs to, with the role in each", roles: "member", ok: { status: 200, schema: ShopsSchema, description: "The shops" }, errors: [401] },
    { method: "post", path: "/api/v1/shops", summary: "Starts a new shop with the caller as its owner", roles: "member", body: NewShopSchema, ok: { status: 201, schema: z.object({ shop: z.object({ id: z.string() }) }), description: "Created" }, errors: [400, 401, 403, 413, 415] },
  ];
}


function jobOperations(): Operation[] {
  const job = "/api/v1/jobs/{id}";
  const photo = `${job}/photos/{photoId}`;
  const ok = (status: number, description: string, schema: z.ZodType = anyObject) => ({ status, schema, description });
  return [
    { method: "get", path: "/api/v1/jobs", summary: "A page of the shop's jobs (a customer: the jobs shared with them)", roles: "member", query: JobListQuerySchema, ok: ok(200, "One page"), errors: [400, 401] },
    { method: "post", path: "/api/v1/jobs", summary: "Opens a job at intake", roles: "staff", body: JobCreateSchema, ok: ok(201, "Created"), errors: [400, 401, 403, 413, 415] },
    { method: "get", path: job, summary: "One job with its plan, events, questions and payments", roles: "job", ok: ok(200, "The job"), errors: [401, 404] },
    { method: "patch", path: job, summary: "Changes a job; the body names the version it was read at", roles: "staff", body: JobPatchSchema, ok: ok(200, "Changed"), errors: [400, 401, 403, 404, 409, 413, 415] },
    { method: "post", path: `${job}/move`, summary: "Moves a job to another status (the customer only approves a shared plan)", roles: "job", body: JobMoveSchema, ok: ok(200, "Moved"), errors: [400, 401, 403, 404, 409, 415] },
    { method: "post", path: `${job}/readings`, summary: "Records the readings after the cut and checks them against the plan", roles: "staff", body: ReadingsBodySchema, ok: ok(201, "Recorded"), errors: [400, 401, 403, 404, 409, 415] },
    { method: "get", path: `${job}/quote`, summary: "The job's quote with its figures (staff also get the shop's rates and the library's kit price)", roles: "job", ok: ok(200, "The quote"), errors: [401, 404] },
    { method: "put", path: `${job}/quote`, summary: "Writes the job's quote; fixed once approved with the plan", roles: "staff", body: QuotePutSchema, ok: ok(200, "Written"), errors: [400, 401, 403, 404, 409, 413, 415] },
    { method: "post", path: `${job}/share`, summary: "Shares the plan with the customer (inviting them into the shop when needed)", roles: "staff", ok: ok(200, "Shared"), errors: [401, 403, 404, 409, 415, 502] },
    { method: "post", path: `${job}/questions`, summary: "Asks the shop a question about the job", roles: "job", body: QuestionSchema, ok: ok(201, "Asked"), errors: [400, 401, 404, 415] },
    { method: "get", path: `${job}/photos`, summary: "The job's photos the caller may see", roles: "job", ok: ok(200, "The photos"), errors: [401, 404] },
    { method: "post", path: `${job}/photos`, summary: "Asks for an upload address for a new photo", roles: "staff", body: PhotoRequestSchema, ok: ok(201, "Where to upload"), errors: [400, 401, 403, 404, 415, 503] },
    { method: "get", path: photo, summary: "Redirects to a short-lived address of the photo", roles: "job", ok: { status: 303, description: "To the photo" }, errors: [401, 404] },
    { method: "patch", path: photo, summary: "Changes a photo's caption or whether the customer sees it", roles: "staff", body: PhotoPatchSchema, ok: ok(200, "Changed"), errors: [400, 401, 403, 404, 415] },
    { method: "post", path: `${photo}/complete`, summary: "Marks a photo's upload as done once the object store holds it", roles: "staff", ok: ok(200, "Completed"), errors: [401, 403, 404, 409, 415] },
    { method: "get", path: `${job}/setup-card.pdf`, summary: "The job's setup card as a PDF", roles: "staff", ok: { status: 200, contentType: "application/pdf", description: "The setup card" }, errors: [401, 403, 404, 409] },
    { method: "get", path: "/api/v1/consult", summary: "The jobs shared with the calling customer", roles: "customer", ok: ok(200, "The jobs"), errors: [401, 403] },
    { method: "post", path: "/api/v1/consult/{id}/approve", summary: "The customer approves the shared plan and its quote (the body names the quote's fingerprint; none for a job with no quote)", roles: "customer", body: ApproveSchema, ok: ok(200, "Approved"), errors: [400, 401, 403, 404, 409, 413, 415] },
    { method: "post", path: "/api/v1/payments/checkout", summary: "Starts (or resumes) the hosted checkout of a job's deposit; answers its address", roles: "customer", body: CheckoutSchema, ok: ok(201, "The checkout", z.object({ url: z.string(), sessionId: z.string() })), errors: [400, 401, 403, 404, 409, 415, 502, 503] },
    { method: "post", path: "/api/v1/payments/webhook", summary: "Events from the payment service, signed over the raw body", roles: "signed", body: anyObject, ok: ok(200, "Received", z.object({ received: z.boolean(), duplicate: z.boolean().optional(), applied: z.boolean().optional() })), errors: [400, 413, 415, 503] },
  ];
}

const ERROR_TEXT: Record<number, string> = {
  400: "Bad input: each bad field is named in error.fields",
  401: "Not signed in",
  403: "The caller's role does not allow this, or the call came from another site",
  404: "No such row in the caller's shop (also for another shop's row)",
  409: "Someone else changed it (stale version), it is still in use, or its state does not allow this",
  413: "The body is too large",
  415: "The body is not JSON",
  422: "The study cannot be evaluated as it stands",
  502: "A service the app relies on refused",
  503: "A service the app relies on is not set up on this server",
};

const ROLE_TEXT: Record<Operation["roles"], string> = {
  staff: "Owner or builder of the active shop.",
  owner: "Owner of the active shop.",
  member: "Any signed-in member of a shop.",
  customer: "A customer of the active shop.",
  job: "The shop's staff, or the job's own customer once the plan is shared.",
  public: "Anyone.",
  signed: "The payment service: the Stripe-Signature header must hold over the raw body.",
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
    for (const [, name] of op.path.matchAll(/\{(\w+)\}/g)) parameters.push({ name, in: "path", required: true, schema: { type: "string" } });
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
      ...(op.roles === "public" || op.roles === "signed" ? { security: [] } : {}),
      ...(parameters.length ? { parameters } : {}),
      ...(op.body ? { requestBody: { required: true, content: { "application/json": { schema: jsonSchema(op.body, "input") } } } } : {}),
      responses,
    };
  }
  return {
    openapi: "3.1.0",
    info: {
      title: "Borewright API",
      version: "1",
      description:
        "Case profiles, cylinder kits, boring rigs, studies and jobs of the caller's active shop. Lengths are in millimetres. " +
        "Every error answers { error: { code, message, fields? } }. Updates name the version they were read at. " +
        "A state-changing call sends JSON (Content-Type: application/json) and, from a browser, comes from the app's own origin.",
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
