import type { FactGroup } from "../lib/report-facts";

/** Groups of label–value rows in one table (prints without breaking inside a group). */
export function FactsTable({ groups }: { groups: FactGroup[] }) {
  return (
    <table className="w-full border-collapse text-sm">
      <caption className="sr-only">Settings of this map</caption>
      {groups.map((g) => (
        <tbody key={g.title} className="break-inside-avoid">
          <tr>
            <th colSpan={2} scope="colgroup" className="border-b border-line-strong pt-4 pb-1.5 text-left text-xs font-semibold tracking-[0.08em] text-well-600 uppercase">
              {g.title}
            </th>
          </tr>
          {g.rows.map(([label, value]) => (
            <tr key={label} className="border-b border-line align-top">
              <th scope="row" className="w-[40%] py-1.5 pr-4 text-left font-normal text-ink-soft">{label}</th>
              <td className="py-1.5 font-mono text-[0.82rem] break-all text-ink">{value}</td>
            </tr>
          ))}
        </tbody>
      ))}
    </table>
  );
}
