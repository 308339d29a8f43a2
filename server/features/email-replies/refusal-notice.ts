import { photoLimits } from "#shared/schemas/questions";
import { HttpError } from "../../http/errors.ts";

export type Language = "en" | "es";

/** Why an attachment was not added; `code` picks the homeowner's words, `reason` is the English text staff see. */
export type Refusal = { filename: string; code: RefusalCode; reason: string };

export type RefusalCode = "unsupported_type" | "heic_unreadable" | "image_contains_code" | "invalid_image" | "image_too_large" | "file_too_large" | "too_many";

const maxMb = photoLimits.maxBytes / (1024 * 1024);
const maxMegapixels = photoLimits.maxPixels / 1_000_000;

const reasons: Record<RefusalCode, Record<Language, string>> = {
  unsupported_type: {
    en: "Only photos (JPEG, PNG, WebP, HEIC) can be attached.",
    es: "Solo se pueden adjuntar fotos (JPEG, PNG, WebP, HEIC).",
  },
  heic_unreadable: {
    en: "This HEIC photo could not be read. Please send it as a JPEG (on iPhone: Settings › Camera › Formats › Most Compatible).",
    es: "No pudimos abrir esta foto HEIC. Envíela como JPEG (en iPhone: Ajustes › Cámara › Formatos › Más compatible).",
  },
  image_contains_code: {
    en: "This file carries more than a photo, so it can't be added. Please send the photo straight from your camera or gallery.",
    es: "Este archivo contiene algo más que una foto y no se puede agregar. Envíe la foto directamente desde su cámara o galería.",
  },
  invalid_image: {
    en: "This photo could not be read. It may be damaged or only partly sent.",
    es: "No pudimos abrir esta foto. Puede estar dañada o incompleta.",
  },
  image_too_large: {
    en: `This photo has more than ${maxMegapixels} megapixels. Please send a smaller photo.`,
    es: `Esta foto tiene más de ${maxMegapixels} megapíxeles. Envíe una foto más pequeña.`,
  },
  file_too_large: {
    en: `Each photo must be smaller than ${maxMb} MB.`,
    es: `Cada foto debe pesar menos de ${maxMb} MB.`,
  },
  too_many: {
    en: `Only the first ${photoLimits.maxCount} photos of one e-mail are added.`,
    es: `Solo se agregan las primeras ${photoLimits.maxCount} fotos de cada correo.`,
  },
};

export function refusal(filename: string, code: RefusalCode): Refusal {
  return { filename, code, reason: reasons[code].en };
}

/** The photo pipeline's refusal as one of ours; anything it did not explain is "could not be read". */
export function refusalOfPipelineError(filename: string, err: unknown): Refusal {
  if (!(err instanceof HttpError)) return refusal(filename, "invalid_image");
  if (err.code === "unsupported_type") return refusal(filename, err.message.includes("HEIC photo") ? "heic_unreadable" : "unsupported_type");
  if (err.code === "image_contains_code" || err.code === "invalid_image" || err.code === "image_too_large") return refusal(filename, err.code);
  return refusal(filename, "invalid_image");
}

export const refusalLines = (refused: readonly Refusal[], language: Language = "en") =>
  refused.map((r) => `- ${r.filename}: ${reasons[r.code][language]}`).join("\n");

/** The short automatic e-mail telling the homeowner which attachments were not added, in their language. */
export function refusalNotice(company: string, refused: readonly Refusal[], language: Language): { subject: string; text: string } {
  const one = refused.length === 1;
  const words =
    language === "es"
      ? {
          subject: one ? "No pudimos agregar su archivo adjunto" : "No pudimos agregar sus archivos adjuntos",
          reached: `Su mensaje llegó a ${company} y nuestro equipo ya lo tiene.`,
          couldNot: one ? "No pudimos agregar uno de los archivos que adjuntó:" : `No pudimos agregar ${refused.length} de los archivos que adjuntó:`,
          howTo: "Para enviar una foto, responda a este correo con la imagen tomada directamente de su cámara o galería, o agréguela a su pregunta en el portal.",
        }
      : {
          subject: one ? "We couldn't add your attachment" : "We couldn't add your attachments",
          reached: `Your message reached ${company} and is with our team.`,
          couldNot: one ? "We could not add one of the files you attached:" : `We could not add ${refused.length} of the files you attached:`,
          howTo: "To send a photo, reply to this e-mail with the picture straight from your camera or gallery, or add it to your question in the portal.",
        };
  return {
    subject: words.subject,
    text: [words.reached, "", words.couldNot, refusalLines(refused, language), "", words.howTo, "", company].join("\n"),
  };
}
