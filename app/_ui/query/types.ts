import type { z } from "zod";
import type { BoringRigSchema, CaseProfileSchema, CutPlanSchema, CylinderKitSchema, ReadingsSchema, StudyLimitsSchema } from "@/geometry";
import type { AssembledStudy } from "@/model/study-assembly";

// Rows of the library & studies API, as the contract in DEVELOPERS.md gives them.

export type Person = { id: string; name: string };

export type RowBase = {
  id: string;
  name: string;
  version: number;
  createdAt: string;
  updatedAt: string;
  createdBy: Person;
  archivedAt: string | null;
};

export type Reading = { valueMm: number; takenBy: Person; takenAt: string };

export type CaseData = z.input<typeof CaseProfileSchema>;
export type KitData = Omit<z.input<typeof CylinderKitSchema>, "id" | "name">;
export type RigData = Omit<z.input<typeof BoringRigSchema>, "name">;

export type CaseRow = RowBase & { notes: string; data: CaseData; mouthReadingsMm: Reading[] };
export type KitRow = RowBase & { notes: string; data: KitData; readings: { skirtDiameter: Reading[]; skirtLength: Reading[] } };
export type RigRow = RowBase & { notes: string; data: RigData };

export type CutPlanInput = z.input<typeof CutPlanSchema>;
export type ReadingsInput = z.input<typeof ReadingsSchema>;
export type StudyLimitsInput = z.input<typeof StudyLimitsSchema>;

export type StudyRow = RowBase & {
  caseId: string;
  /** The case profile's name, for lists. */
  caseName?: string;
  kitIds: string[];
  rigId: string | null;
  cut: CutPlanInput | null;
  readings: ReadingsInput | null;
  limits: StudyLimitsInput | null;
  chosenKitId: string | null;
  notes: string;
};

export type Page<T> = { items: T[]; page: number; pageSize: number; total: number };

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
export type HistoryEntry = { at: string; by: Person; summary: string };

export type { ShopSettings } from "@/model/schemas";

export type CsvReportRow = { line: number; ok: boolean; errors?: Record<string, string>; name?: string };
export type CsvReport = { rows: CsvReportRow[]; written: number };
