import { HydrationBoundary, dehydrate } from "@tanstack/react-query";
import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { AccessError } from "@/db/access";
import { SHOP_STAFF } from "@/db/roles";
import { getStudy } from "@/db/studies";
import { requirePage } from "../../../_ui/guard";
import { QueryProvider } from "../../../_ui/query/provider";
import { getServerQueryClient } from "../../../_ui/query/server";
import { studyKeys } from "../../../_ui/query/studies/keys";
import type { StudyDetail } from "../../../_ui/query/types";
import { StudyEditor } from "./_components/study-editor";

export const metadata: Metadata = { title: "Study" };

export default async function StudyPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const caller = await requirePage(`/studies/${id}`, SHOP_STAFF);
  const qc = getServerQueryClient();
  try {
    // The data layer checks the role and that the study belongs to the caller's shop (404 otherwise).
    const detail = (await getStudy(caller, id)) as unknown as StudyDetail;
    qc.setQueryData(studyKeys.detail(id), detail);
  } catch (error) {
    if (error instanceof AccessError && error.code === "not_found") notFound();
    throw error;
  }
  return (
    <QueryProvider>
      <HydrationBoundary state={dehydrate(qc)}>
        <StudyEditor id={id} units={caller.units} />
      </HydrationBoundary>
    </QueryProvider>
  );
}
