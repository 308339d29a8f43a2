import { EmptyState, Page } from "#shared/ui/index";
import { provenanceLedger, valuesNeedingPublishedSource } from "#shared/engine/tables/ledger";
import { LedgerEntryCard } from "./components/ledger-entry-card.tsx";
import { byTable, tableLabel } from "./lib/labels.ts";

/*
 * Read straight from the engine's tables (pure code bundled with this screen), not from the
 * server: nothing to load, so no loading or error state, and the list is always the tables'
 * own marks for the code that is running.
 */
export function SourcesToCheckRoute() {
  const needing = valuesNeedingPublishedSource();
  const total = provenanceLedger().length;
  return (
    <Page
      title="Sources to check"
      width="wide"
      intro={
        <>
          Care-plan values recalled from a kind of publication rather than read from one. Each needs a published source. Until it
          has one, homeowners are never shown it as a citation: their &ldquo;Why?&rdquo; says it is common practice being checked.
        </>
      }
    >
      {needing.length === 0 ? (
        <EmptyState title="Every value has a source">All {total} sourced values in the care-plan tables are published or common practice.</EmptyState>
      ) : (
        <div className="flex flex-col gap-6">
          <p>
            <strong>{needing.length}</strong> of {total} sourced values still need a published source.
          </p>
          {byTable(needing).map((group) => (
            <section key={group.table} aria-labelledby={`table-${group.table}`} className="flex flex-col gap-3">
              <h2 id={`table-${group.table}`} className="text-2xl text-pine-900">
                {tableLabel(group.table)} <span className="text-base font-normal text-ink-soft">({group.entries.length})</span>
              </h2>
              <ul className="flex flex-col gap-3">
                {group.entries.map((entry) => (
                  <LedgerEntryCard key={entry.path} entry={entry} />
                ))}
              </ul>
            </section>
          ))}
        </div>
      )}
    </Page>
  );
}
