import type { CsvReport } from "../../../_ui/query/types";
import { HeadRow } from "../../../_ui/table/head-row";

/** The per-row report of a CSV check: the line, the name, and what is wrong in each bad column. */
export function CsvReportTable({ report }: { report: CsvReport }) {
  return (
    <div className="max-h-80 overflow-auto rounded-md border border-rule">
      <table className="w-full text-sm" aria-label="CSV rows checked">
        <HeadRow className="sticky top-0 bg-paper-2 text-left" cellClassName="px-3 py-1.5 font-medium" columns={["Line", "Name", "Result"]} />
        <tbody>
          {report.rows.map((r) => (
            <tr key={r.line} className={`border-t border-rule ${r.ok ? "" : "bg-caution-soft"}`}>
              <td className="px-3 py-1.5 num">{r.line}</td>
              <td className="px-3 py-1.5">{r.name ?? "—"}</td>
              <td className="px-3 py-1.5">
                {r.ok ? (
                  <span className="text-success">✓ good</span>
                ) : (
                  <ul className="text-error">
                    {Object.entries(r.errors ?? {}).map(([col, msg]) => (
                      <li key={col}>
                        <span className="num">{col}</span>: {msg}
                      </li>
                    ))}
                  </ul>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
