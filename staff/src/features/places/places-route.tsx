import { useState } from "react";
import type { Place } from "#shared/schemas/place-rules";
import { Button, ConfirmDialog, EmptyState, ErrorState, LoadingState, Notice, Page, errorMessage, useMe } from "#shared/ui/index";
import { useDeletePlace } from "./api/delete-place.ts";
import { usePlaces } from "./api/get-places.ts";
import { PlaceCard } from "./components/place-card.tsx";
import { PlaceEditor } from "./components/place-editor.tsx";

type Editing = { place: Place | null } | null;

/** The rules of the places the company works in. Managers edit them; technicians read them. */
export function PlacesRoute() {
  const places = usePlaces();
  const { data: me } = useMe();
  const manager = me?.role === "manager";
  const [editing, setEditing] = useState<Editing>(null);
  const [deleting, setDeleting] = useState<Place | null>(null);
  const [done, setDone] = useState<string | null>(null);
  const remove = useDeletePlace();

  const finish = (message: string | null) => {
    setEditing(null);
    setDone(message);
  };

  return (
    <Page
      title="Places"
      width="wide"
      intro={
        <>
          <p>Fertilizer blackout dates, phosphorus limits and watering days of the places you work in. New care plans follow the rules of the lawn's place.</p>
          <p className="mt-2 font-semibold">
            Check your state, county and water utility rules; Sproutline applies what you enter and knows no law of its own. Where the local rules say otherwise, they win.
          </p>
        </>
      }
      actions={
        manager && !editing ? (
          <Button
            onClick={() => {
              setDone(null);
              setEditing({ place: null });
            }}
          >
            Add a place
          </Button>
        ) : undefined
      }
    >
      {done && (
        <Notice tone="success" className="mb-6">
          {done}
        </Notice>
      )}
      {editing ? (
        <PlaceEditor place={editing.place} onDone={(name) => finish(name ? `Saved ${name}. New and regenerated plans use these rules; plans already made keep theirs.` : null)} />
      ) : (
        <>
          {places.isError && <ErrorState title="The places didn't load" error={places.error} onRetry={() => void places.refetch()} retrying={places.isFetching} />}
          {places.isPending && !places.isError && <LoadingState label="Loading the places…" />}
          {places.data && places.data.length === 0 && (
            <EmptyState title="No places yet">
              {manager ? "Add the places you work in, with their fertilizer dates, phosphorus rule and watering days." : "A manager adds the places the company works in."} Until then plans follow no local rules.
            </EmptyState>
          )}
          {places.data && places.data.length > 0 && (
            <ul className="grid gap-4 md:grid-cols-2">
              {places.data.map((p) => (
                <PlaceCard
                  key={p.id}
                  place={p}
                  onEdit={
                    manager
                      ? () => {
                          setDone(null);
                          setEditing({ place: p });
                        }
                      : undefined
                  }
                  onDelete={
                    manager
                      ? () => {
                          remove.reset();
                          setDeleting(p);
                        }
                      : undefined
                  }
                />
              ))}
            </ul>
          )}
        </>
      )}
      <ConfirmDialog
        open={deleting !== null}
        title={deleting ? `Delete ${deleting.name}?` : "Delete this place?"}
        confirmLabel="Delete place"
        pendingLabel="Deleting…"
        variant="danger"
        pending={remove.isPending}
        error={remove.error ? errorMessage(remove.error) : null}
        onCancel={() => setDeleting(null)}
        onConfirm={() => {
          if (!deleting) return;
          const name = deleting.name;
          remove.mutate(deleting.id, {
            onSuccess: () => {
              setDeleting(null);
              setDone(`Deleted ${name}. Plans already made keep its rules; new plans of its lawns follow none until you add a place for them.`);
            },
          });
        }}
      >
        <p>New plans of its lawns will follow no place rules. Plans already made keep the rules they were made with.</p>
      </ConfirmDialog>
    </Page>
  );
}
