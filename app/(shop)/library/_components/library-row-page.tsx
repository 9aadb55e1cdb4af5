import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { SHOP_STAFF } from "@/db/roles";
import { requirePage } from "../../../_ui/guard";
import { QueryProvider } from "../../../_ui/query/provider";
import { EntityForm } from "./entity-form";
import { libraryKind } from "./kind";
import { KIND_WORDS } from "./library-tabs";

/** The page title of a library row's form: "New case profile", "Edit kit"; "Library" for a shelf that does not exist. */
export async function rowFormTitle(params: Promise<{ kind: string }>, verb: "New" | "Edit"): Promise<Metadata> {
  const kind = libraryKind((await params).kind);
  return { title: kind ? `${verb} ${KIND_WORDS[kind].one}` : "Library" };
}

/** A library row's form for shop staff, new (`id` null) or of a saved row; a shelf that does not exist is a 404. */
export async function LibraryRowPage({ rawKind, id }: { rawKind: string; id: string | null }) {
  const caller = await requirePage(`/library/${rawKind}/${id ?? "new"}`, SHOP_STAFF);
  const kind = libraryKind(rawKind);
  if (!kind) notFound();
  return (
    <QueryProvider>
      <EntityForm kind={kind} id={id} units={caller.units} />
    </QueryProvider>
  );
}
