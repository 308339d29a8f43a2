import type { CallbackReport } from "#shared/schemas/callback-report";
import { chartColours, formatCount, formatHours, formatMoney, formatMonth, formatRate, reasonLabel } from "../lib/format.ts";
import { serviceLabel } from "#shared/ui/index";
import { ReportBarChart } from "./bar-chart.tsx";
import { BreakdownSection } from "./breakdown-section.tsx";
import { ReportTable, type ReportColumn } from "./report-table.tsx";

type RateRow = { seedingVisits: number; callbacks: number; ratePer100: number | null };

const rateColumns = <Row extends RateRow>(first: ReportColumn<Row>): ReportColumn<Row>[] => [
  first,
  { header: "Seeding visits", cell: (r) => formatCount(r.seedingVisits), numeric: true },
  { header: "Callbacks", cell: (r) => formatCount(r.callbacks), numeric: true },
  { header: "Rate per 100", cell: (r) => formatRate(r.ratePer100), numeric: true },
];

/** "Highest: Marco Ibsen, 12.5 per 100 seeding visits." — the chart's message in words. */
function highestRate<Row extends RateRow>(rows: Row[], name: (row: Row) => string): string {
  const withRate = rows.filter((r) => r.ratePer100 !== null && r.callbacks > 0);
  if (withRate.length === 0) return "No callbacks from these seeding visits.";
  const top = withRate.reduce((a, b) => ((b.ratePer100 ?? 0) > (a.ratePer100 ?? 0) ? b : a));
  return `Highest: ${name(top)}, ${formatRate(top.ratePer100)} callbacks per 100 seeding visits (${formatCount(top.callbacks)} of ${formatCount(top.seedingVisits)}).`;
}

const rateBars = <Row extends RateRow>(rows: Row[], name: (row: Row) => string) => rows.map((r) => ({ label: name(r), value: r.ratePer100 ?? 0 }));

export function ByTechnician({ report }: { report: CallbackReport }) {
  const rows = report.byTechnician;
  const name = (r: (typeof rows)[number]) => r.technicianName;
  return (
    <BreakdownSection
      id="by-technician"
      title="By technician"
      summary={highestRate(rows, name)}
      chart={<ReportBarChart bars={rateBars(rows, name)} unit="per 100 seeding visits" />}
      table={
        <ReportTable
          caption="Callback rate by technician who did the seeding visit"
          rows={rows}
          rowKey={(r) => String(r.technicianId)}
          columns={rateColumns({ header: "Technician", cell: name })}
          empty="No seeding visits in this range."
        />
      }
    />
  );
}

export function ByService({ report }: { report: CallbackReport }) {
  const rows = report.byService;
  const name = (r: (typeof rows)[number]) => serviceLabel(r.service);
  return (
    <BreakdownSection
      id="by-service"
      title="By service done on the visit"
      summary={<>{highestRate(rows, name)} A visit with several services counts under each.</>}
      chart={<ReportBarChart bars={rateBars(rows, name)} unit="per 100 seeding visits" />}
      table={
        <ReportTable
          caption="Callback rate by service done on the seeding visit"
          rows={rows}
          rowKey={(r) => r.service}
          columns={rateColumns({ header: "Service", cell: name })}
          empty="No seeding visits in this range."
        />
      }
    />
  );
}

export function ByReason({ report }: { report: CallbackReport }) {
  const rows = report.byReason;
  const top = rows.reduce<(typeof rows)[number] | null>((a, b) => (!a || b.callbacks > a.callbacks ? b : a), null);
  return (
    <BreakdownSection
      id="by-reason"
      title="By reason"
      summary={top ? `Most common: ${reasonLabel(top.reason)}, ${formatCount(top.callbacks)} callbacks costing ${formatMoney(top.totalCost)}.` : "No callbacks in this range."}
      chart={<ReportBarChart bars={rows.map((r) => ({ label: reasonLabel(r.reason), value: r.ratePer100 ?? 0 }))} unit="per 100 seeding visits" colour={chartColours.cost} />}
      table={
        <ReportTable
          caption="Callbacks by reason, with their cost"
          rows={rows}
          rowKey={(r) => r.reason}
          columns={[
            { header: "Reason", cell: (r) => reasonLabel(r.reason) },
            { header: "Callbacks", cell: (r) => formatCount(r.callbacks), numeric: true },
            { header: "Rate per 100", cell: (r) => formatRate(r.ratePer100), numeric: true },
            { header: "Labor", cell: (r) => formatHours(r.labourHours), numeric: true },
            { header: "Cost", cell: (r) => formatMoney(r.totalCost), numeric: true },
          ]}
          empty="No callbacks in this range."
        />
      }
    />
  );
}

export function ByMonth({ report }: { report: CallbackReport }) {
  const rows = report.byMonth;
  const name = (r: (typeof rows)[number]) => formatMonth(r.month);
  return (
    <BreakdownSection
      id="by-month"
      title="By month of the seeding visit"
      summary={highestRate(rows, name)}
      chart={<ReportBarChart bars={rateBars(rows, name)} unit="per 100 seeding visits" orientation="columns" />}
      table={
        <ReportTable
          caption="Callback rate and cost by month of the seeding visit"
          rows={rows}
          rowKey={(r) => r.month}
          columns={[...rateColumns({ header: "Month", cell: name }), { header: "Cost", cell: (r) => formatMoney(r.totalCost), numeric: true }]}
          empty="No months in this range."
        />
      }
    />
  );
}
