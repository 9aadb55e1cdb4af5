import type { z } from "zod";
import type { CutPlanSchema, ReadingsSchema, StudyLimitsSchema } from "@/geometry";
import type { CaseRow, KitRow, PersonSchema, RigRow, StudyRow } from "@/model/schemas";
import type { AssembledStudy } from "@/model/study-assembly";

// The browser's names for the API's shapes. Every row type is the one the API's own schemas infer
// (model/schemas); only what the browser adds (list parameters, the detail it caches) is written here.

export type { CaseRow, KitRow, Page, Reading, RigRow, ShopSettings, StudyRow } from "@/model/schemas";
export type { CaseData, KitData, RigData } from "@/model/schemas";
export type { CsvImportResult as CsvReport, CsvImportRow as CsvReportRow, HistoryItem as HistoryEntry } from "@/model/schemas";

export type Person = z.infer<typeof PersonSchema>;
export type RowBase = Pick<CaseRow, "id" | "name" | "version" | "createdAt" | "updatedAt" | "createdBy" | "archivedAt">;

export type CutPlanInput = z.input<typeof CutPlanSchema>;
export type ReadingsInput = z.input<typeof ReadingsSchema>;
export type StudyLimitsInput = z.input<typeof StudyLimitsSchema>;

export type ListParams = {
  page: number;
  pageSize: number;
  sort?: string;
  dir?: "asc" | "desc";
  q?: string;
  archived?: boolean;
};

export type LibraryKind = "cases" | "kits" | "rigs";
export type RowOf<K extends LibraryKind> = K extends "cases" ? CaseRow : K extends "kits" ? KitRow : RigRow;

/** A study's row and the Study the server assembled from its rows (unchecked while the study is incomplete). */
export type StudyDetail = { item: StudyRow; study: AssembledStudy };
