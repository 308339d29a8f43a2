import type { PhotoRef } from "#shared/schemas/questions";

/** The photo open in the full-size dialog, with the words that describe it. */
export interface PhotoViewing {
  photo: PhotoRef;
  alt: string;
  caption: string;
}

export type OpenPhoto = (viewing: PhotoViewing) => void;

const stampFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "medium", timeStyle: "short" });
const dayFormat = new Intl.DateTimeFormat("en-US", { dateStyle: "medium" });

export const formatStamp = (iso: string) => stampFormat.format(new Date(iso));
export const formatDay = (iso: string) => dayFormat.format(new Date(iso));
