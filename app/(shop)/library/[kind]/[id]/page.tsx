import { LibraryRowPage, rowFormTitle } from "../../_components/library-row-page";

export const generateMetadata = ({ params }: { params: Promise<{ kind: string }> }) => rowFormTitle(params, "Edit");

export default async function EditLibraryRowPage({ params }: { params: Promise<{ kind: string; id: string }> }) {
  const { kind, id } = await params;
  return <LibraryRowPage rawKind={kind} id={id} />;
}
