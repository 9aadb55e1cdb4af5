import { LibraryRowPage, rowFormTitle } from "../../_components/library-row-page";

export const generateMetadata = ({ params }: { params: Promise<{ kind: string }> }) => rowFormTitle(params, "New");

export default async function NewLibraryRowPage({ params }: { params: Promise<{ kind: string }> }) {
  const { kind } = await params;
  return <LibraryRowPage rawKind={kind} id={null} />;
}
