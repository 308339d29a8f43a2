import { useState } from "react";
import { Button, ErrorState, LoadingState, Notice, Page, isApiRequestError } from "#shared/ui/index";
import { outboxRefetchMs, useOutbox } from "./api/get-outbox.ts";
import { OutboxList } from "./components/outbox-list.tsx";

const clock = new Intl.DateTimeFormat("en-US", { timeStyle: "medium" });

/** Development only: every SMS and e-mail the local fakes received, so a demo can follow a link. */
export function OutboxRoute() {
  const outbox = useOutbox();
  // Only a press of the button shows progress; the automatic checks stay quiet.
  const [refreshing, setRefreshing] = useState(false);
  const refresh = () => {
    setRefreshing(true);
    void outbox.refetch().finally(() => setRefreshing(false));
  };

  const notHere = isApiRequestError(outbox.error) && outbox.error.status === 404;

  return (
    <Page
      title="Outbox (development)"
      width="wide"
      intro={
        <>
          Every text message and e-mail the local fakes received, newest first. Checks again every {outboxRefetchMs / 1000} seconds
          {outbox.dataUpdatedAt > 0 && <> — last checked {clock.format(outbox.dataUpdatedAt)}</>}.
        </>
      }
      actions={
        !notHere && (
          <Button variant="secondary" onClick={refresh} pending={refreshing} pendingLabel="Refreshing…">
            Refresh
          </Button>
        )
      }
    >
      {notHere ? (
        <Notice tone="warning" title="No outbox here">
          The outbox exists only in development and test runs, where messages go to local fakes instead of real phones and inboxes.
        </Notice>
      ) : (
        <div className="flex flex-col gap-4">
          {outbox.isError && <ErrorState title="The outbox didn't load" error={outbox.error} onRetry={refresh} retrying={refreshing} />}
          {outbox.isPending && !outbox.isError && <LoadingState label="Loading messages…" />}
          {outbox.data && <OutboxList messages={outbox.data} />}
        </div>
      )}
    </Page>
  );
}
