import type { PhotoRef } from "#shared/schemas/questions";

export interface PhotoButtonProps {
  photo: PhotoRef;
  alt: string;
  /** "large" shows the big copy (the question's own photos); "thumb" the small one. */
  size?: "large" | "thumb";
  onOpen: () => void;
  className?: string;
}

/** A photo that opens full size when pressed (tap, click, Enter or Space). */
export function PhotoButton({ photo, alt, size = "thumb", onOpen, className = "" }: PhotoButtonProps) {
  return (
    <button type="button" onClick={onOpen} className={`group relative block overflow-hidden rounded-lg border border-line bg-canvas ${className}`}>
      <img
        src={size === "large" ? photo.url : photo.thumbUrl}
        alt={alt}
        width={photo.width}
        height={photo.height}
        loading="lazy"
        className="aspect-[4/3] h-auto w-full object-cover"
      />
      <span className="absolute right-2 bottom-2 rounded-md bg-surface/90 px-2 text-sm font-semibold text-pine-900 group-hover:underline">
        <span className="sr-only">, open </span>Full size
      </span>
    </button>
  );
}
