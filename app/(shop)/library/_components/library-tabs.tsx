import Link from "next/link";
import type { LibraryKind } from "../../../_ui/query/types";

export const KIND_WORDS: Record<LibraryKind, { plural: string; one: string; tab: string }> = {
  cases: { plural: "case profiles", one: "case profile", tab: "Case profiles" },
  kits: { plural: "cylinder kits", one: "cylinder kit", tab: "Cylinder kits" },
  rigs: { plural: "boring rigs", one: "boring rig", tab: "Boring rigs" },
};

/** The three shelves of the library, as links (each is its own address). */
export function LibraryTabs({ active }: { active: LibraryKind }) {
  return (
    <nav aria-label="Library sections" className="flex gap-1 border-b border-rule">
      {(Object.keys(KIND_WORDS) as LibraryKind[]).map((k) => (
        <Link
          key={k}
          href={`/library?kind=${k}`}
          aria-current={k === active ? "page" : undefined}
          className={`-mb-px rounded-t-md border px-4 py-2 text-sm no-underline ${
            k === active ? "border-rule border-b-paper bg-paper font-semibold text-ink" : "border-transparent text-ink-2 hover:text-ink"
          }`}
        >
          {KIND_WORDS[k].tab}
        </Link>
      ))}
    </nav>
  );
}
