import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { SHOP_STAFF } from "@/db/roles";
import { requirePage } from "../../../../_ui/guard";
import { QueryProvider } from "../../../../_ui/query/provider";
import { EntityForm } from "../../_components/entity-form";
import { libraryKind } from "../../_components/kind";
import { KIND_WORDS } from "../../_components/library-tabs";

export async function generateMetadata({ params }: { params: Promise<{ kind: string }> }): Promise<Metadata> {
  const kind = libraryKind((await params).kind);
  return { title: kind ? `New ${KIND_WORDS[kind].one}` : "Library" };
}

export default async function NewLibraryRowPage({ params }: { params: Promise<{ kind: string }> }) {
  const { kind: raw } = await params;
  const caller = await requirePage(`/library/${raw}/new`, SHOP_STAFF);
  const kind = libraryKind(raw);
  if (!kind) notFound();
  return (
    <QueryProvider>
      <EntityForm kind={kind} id={null} units={caller.units} />
    </QueryProvider>
  );
}
