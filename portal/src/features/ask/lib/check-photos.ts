import { photoLimits } from "#shared/schemas/questions";

export type PhotoProblem =
  | { kind: "tooMany" }
  | { kind: "wrongType"; name: string }
  | { kind: "tooLarge"; name: string };

const acceptedTypes = new Set<string>(photoLimits.acceptedTypes);
// Some phones hand over HEIC photos with no type at all; the extension is all we have.
const heicExtension = /\.(heic|heif)$/i;

function isAccepted(file: File): boolean {
  return acceptedTypes.has(file.type) || (file.type === "" && heicExtension.test(file.name));
}

/** Only what we can't make smaller ourselves must fit the limit as chosen (browsers decode JPEG, PNG and WebP). */
function canShrink(file: File): boolean {
  return ["image/jpeg", "image/png", "image/webp"].includes(file.type);
}

/**
 * Checks newly picked photos before anything is sent, so the person learns at once
 * (the server checks again from the bytes). Returns the photos to keep and what was wrong.
 */
export function checkPickedPhotos(already: number, picked: readonly File[]): { accepted: File[]; problems: PhotoProblem[] } {
  const accepted: File[] = [];
  const problems: PhotoProblem[] = [];
  for (const file of picked) {
    if (!isAccepted(file)) problems.push({ kind: "wrongType", name: file.name });
    else if (file.size > photoLimits.maxBytes && !canShrink(file)) problems.push({ kind: "tooLarge", name: file.name });
    else if (already + accepted.length >= photoLimits.maxCount) {
      if (!problems.some((p) => p.kind === "tooMany")) problems.push({ kind: "tooMany" });
    } else accepted.push(file);
  }
  return { accepted, problems };
}

export const maxPhotoMegabytes = photoLimits.maxBytes / (1024 * 1024);
