import { HydrationBoundary, dehydrate } from "@tanstack/react-query";
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { AccessError } from "@/db/access";
import { SHOP_STAFF } from "@/db/roles";
import { listLibrary } from "@/db/library";
import { getSettings } from "@/db/settings";
import { getStudyWithRows, studyHistory } from "@/db/studies";
import { requirePage } from "../../../_ui/guard";
import { QueryProvider } from "../../../_ui/query/provider";
import { getServerQueryClient } from "../../../_ui/query/server";
import { libraryKeys } from "../../../_ui/query/library/keys";
import { settingsKeys } from "../../../_ui/query/settings/keys";
import { studyKeys } from "../../../_ui/query/studies/keys";
import type { ListParams, StudyDetail } from "../../../_ui/query/types";
import { StudyJobs } from "../../jobs/_components/study-jobs";
import { StudyEditor } from "./_components/study-editor";

export const metadata: Metadata = { title: "Study" };

/** The list each picker of the study (case, kits, rig) asks for: every live row by name (useLibraryOptions). */
const PICKER_LIST = { page: 1, pageSize: 100, sort: "name", dir: "asc" } as const satisfies ListParams;

export default async function StudyPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await requirePage(`/studies/${id}`, SHOP_STAFF);
  const qc = getServerQueryClient();
  try {
    // The data layer checks the role and that the study belongs to the caller's shop (404 otherwise).
    const { item, study, rows } = await getStudyWithRows(caller, id);
    qc.setQueryData<StudyDetail>(studyKeys.detail(id), { item, study });
    // The rows the server assembled the study from: the studio assembles the same Study from them at once.
    if (rows.case) qc.setQueryData(libraryKeys.detail("cases", rows.case.id), rows.case);
    for (const kit of rows.kits) qc.setQueryData(libraryKeys.detail("kits", kit.id), kit);
    if (rows.rig) qc.setQueryData(libraryKeys.detail("rigs", rows.rig.id), rows.rig);
    // The shop's limits, the study's history and the pickers' lists too, so the page the server renders is the
    // page the browser keeps: no second evaluation and no panel filling in once the browser has fetched them itself.
    const [settings, history, cases, kits, rigs] = await Promise.all([
      getSettings(caller),
      studyHistory(caller, id),
      listLibrary(caller, "cases", { ...PICKER_LIST, archived: "0" }),
      listLibrary(caller, "kits", { ...PICKER_LIST, archived: "0" }),
      listLibrary(caller, "rigs", { ...PICKER_LIST, archived: "0" }),
    ]);
    qc.setQueryData(settingsKeys.shop(), settings);
    qc.setQueryData(studyKeys.history(id), history);
    qc.setQueryData(libraryKeys.list("cases", PICKER_LIST), cases);
    qc.setQueryData(libraryKeys.list("kits", PICKER_LIST), kits);
    qc.setQueryData(libraryKeys.list("rigs", PICKER_LIST), rigs);
  } catch (error) {
    if (error instanceof AccessError && error.code === "not_found") notFound();
    throw error;
  }
  return (
    <QueryProvider>
      <StudyJobs caller={caller} studyId={id} />
      <HydrationBoundary state={dehydrate(qc)}>
        <StudyEditor id={id} units={caller.units} />
      </HydrationBoundary>
    </QueryProvider>
  );
}
