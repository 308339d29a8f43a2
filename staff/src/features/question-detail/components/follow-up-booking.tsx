import { useState } from "react";
import { followUpReasonLabels, type FollowUp } from "#shared/schemas/follow-ups";
import { Button, Dialog, Notice, formatCalendarDay } from "#shared/ui/index";
import type { FollowUpContext } from "../lib/follow-up-form.ts";
import { FollowUpForm } from "./follow-up-form.tsx";

/** "Book a follow-up visit" from the question, and what was booked once it is. */
export function FollowUpBooking({ context }: { context: FollowUpContext }) {
  const [open, setOpen] = useState(false);
  const [booked, setBooked] = useState<FollowUp | null>(null);

  return (
    <section aria-labelledby="follow-up-heading" className="rounded-xl border border-line bg-surface p-4 sm:p-5">
      <h2 id="follow-up-heading" className="text-xl text-pine-900">
        Does the lawn need a visit?
      </h2>
      <p className="mt-1 text-ink-soft">Book a follow-up visit and record why, so the callback report can count it.</p>
      {booked && (
        <Notice tone="success" title="Follow-up visit booked" className="mt-3">
          {followUpReasonLabels[booked.reason]}
          {booked.scheduledFor ? ` · ${formatCalendarDay(booked.scheduledFor, { withYear: true })}` : " · no date yet"}
          {booked.technicianName ? ` · ${booked.technicianName}` : " · not assigned yet"}
          {booked.isCallback ? " · callback" : ""} ({booked.status})
        </Notice>
      )}
      <Button variant="secondary" className="mt-3" onClick={() => setOpen(true)}>
        Book a follow-up visit
      </Button>
      <Dialog open={open} onClose={() => setOpen(false)} title="Book a follow-up visit" description="Record why the lawn needs a return visit.">
        <FollowUpForm
          context={context}
          onCancel={() => setOpen(false)}
          onBooked={(followUp) => {
            setBooked(followUp);
            setOpen(false);
          }}
        />
      </Dialog>
    </section>
  );
}
