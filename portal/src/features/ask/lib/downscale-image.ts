/** Longest side we send; more detail than a technician needs, and a fraction of a phone photo's bytes. */
export const maxUploadEdge = 2048;
const jpegQuality = 0.85;

function jpegName(name: string): string {
  return `${name.replace(/\.[^.]+$/, "") || "photo"}.jpg`;
}

async function canvasToJpeg(bitmap: ImageBitmap, width: number, height: number): Promise<Blob | null> {
  if (typeof OffscreenCanvas !== "undefined") {
    const canvas = new OffscreenCanvas(width, height);
    const context = canvas.getContext("2d");
    if (!context) return null;
    // JPEG has no transparency: paint white first so clear PNG areas don't turn black.
    context.fillStyle = "#fff";
    context.fillRect(0, 0, width, height);
    context.drawImage(bitmap, 0, 0, width, height);
    return canvas.convertToBlob({ type: "image/jpeg", quality: jpegQuality });
  }
  const canvas = document.createElement("canvas");
  canvas.width = width;
  canvas.height = height;
  const context = canvas.getContext("2d");
  if (!context) return null;
  context.fillStyle = "#fff";
  context.fillRect(0, 0, width, height);
  context.drawImage(bitmap, 0, 0, width, height);
  return new Promise((resolve) => canvas.toBlob(resolve, "image/jpeg", jpegQuality));
}

/**
 * Makes a phone photo at most 2048 px on its longest side, as JPEG, before it leaves the phone:
 * a fraction of the upload on a weak signal. Anything the browser can't decode (HEIC on most
 * browsers) or can't shrink goes as it is; the server re-encodes every photo anyway.
 */
export async function downscaleImage(file: File): Promise<File> {
  if (typeof createImageBitmap === "undefined") return file;
  let bitmap: ImageBitmap;
  try {
    // Apply the camera's rotation now: the canvas would otherwise drop it with the metadata.
    bitmap = await createImageBitmap(file, { imageOrientation: "from-image" });
  } catch {
    return file;
  }
  try {
    const scale = Math.min(1, maxUploadEdge / Math.max(bitmap.width, bitmap.height));
    if (scale === 1 && file.type === "image/jpeg") return file;
    const blob = await canvasToJpeg(bitmap, Math.round(bitmap.width * scale), Math.round(bitmap.height * scale));
    if (!blob || (scale === 1 && blob.size >= file.size)) return file;
    return new File([blob], jpegName(file.name), { type: "image/jpeg", lastModified: file.lastModified });
  } catch {
    return file;
  } finally {
    bitmap.close();
  }
}
