import { TextField } from "#shared/ui/index";
import type { UseFormRegister } from "react-hook-form";
import { CHECK_IN_DAY_BOUNDS } from "#shared/engine/index";
import type { SettingsErrors, SettingsFormValues } from "../lib/settings-form.ts";

/** The settings that are lists or clock times rather than one bounded number. */
export function OtherSettings({ register, errors }: { register: UseFormRegister<SettingsFormValues>; errors: SettingsErrors }) {
  return (
    <section aria-labelledby="program-times" className="flex flex-col gap-3">
      <h2 id="program-times" className="text-2xl text-pine-900">
        Times and check-in photos
      </h2>
      <div className="grid gap-4 rounded-xl border border-line bg-surface p-4 md:grid-cols-2">
        <TextField
          label="Deep watering start time"
          type="time"
          hint="Controllers often run before dawn, when less water evaporates."
          error={errors.deepWateringTime}
          {...register("deepWateringTime")}
        />
        <TextField
          label="Light watering start times (optional)"
          hint="One time per light watering a day, earliest first, e.g. 07:00, 12:00, 16:00. Leave empty to let the plan spread them over the day."
          error={errors.germinationWateringTimes}
          {...register("germinationWateringTimes")}
        />
        <TextField
          label="Extra check-in photo days"
          hint={`Days after the visit when we ask for a photo, besides the ones timed to the sprouts; up to ${CHECK_IN_DAY_BOUNDS.maxEntries}, each ${CHECK_IN_DAY_BOUNDS.min}–${CHECK_IN_DAY_BOUNDS.max}.`}
          error={errors.checkInPhotoDays}
          {...register("checkInPhotoDays")}
        />
      </div>
    </section>
  );
}
