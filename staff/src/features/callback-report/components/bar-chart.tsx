import { Bar, BarChart, CartesianGrid, Cell, ResponsiveContainer, XAxis, YAxis } from "recharts";
import { chartColours } from "../lib/format.ts";

export interface ChartBar {
  label: string;
  value: number;
}

export interface ReportBarChartProps {
  bars: ChartBar[];
  /** What the value axis counts, e.g. "per 100 seeding visits". */
  unit: string;
  colour?: string;
  /** Bars side by side (months) instead of stacked rows (names, which are long). */
  orientation?: "rows" | "columns";
}

/**
 * A picture of the table next to it. Hidden from screen readers (the table and the
 * summary line carry the same facts) and kept out of the tab order.
 */
export function ReportBarChart({ bars, unit, colour = chartColours.rate, orientation = "rows" }: ReportBarChartProps) {
  // All-zero bars say nothing the summary line doesn't.
  if (bars.every((bar) => bar.value === 0)) return null;
  const highest = Math.max(...bars.map((b) => b.value));
  const rows = orientation === "rows";
  const height = rows ? Math.max(140, bars.length * 44 + 48) : 260;
  return (
    <div aria-hidden="true" className="rounded-xl border border-line bg-surface p-2" style={{ height }}>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart data={bars} layout={rows ? "vertical" : "horizontal"} accessibilityLayer={false} margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
          <CartesianGrid stroke={chartColours.grid} horizontal={!rows} vertical={rows} />
          {rows ? (
            <>
              <XAxis type="number" allowDecimals={false} tick={{ fill: chartColours.ink, fontSize: 13 }} unit="" />
              <YAxis type="category" dataKey="label" width={120} tick={{ fill: chartColours.ink, fontSize: 13 }} />
            </>
          ) : (
            <>
              <XAxis type="category" dataKey="label" tick={{ fill: chartColours.ink, fontSize: 12 }} interval="preserveStartEnd" />
              <YAxis type="number" width={40} tick={{ fill: chartColours.ink, fontSize: 13 }} />
            </>
          )}
          <Bar dataKey="value" name={unit} isAnimationActive={false} radius={rows ? [0, 4, 4, 0] : [4, 4, 0, 0]}>
            {bars.map((bar) => (
              <Cell key={bar.label} fill={bar.value === highest && highest > 0 ? chartColours.highlight : colour} />
            ))}
          </Bar>
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
