/** A small picture per kind of step, so a list can be scanned at a glance. Decorative. */
const common = {
  viewBox: "0 0 24 24",
  "aria-hidden": true,
  focusable: false,
  fill: "none",
  stroke: "currentColor",
  strokeWidth: 2,
  strokeLinecap: "round",
  strokeLinejoin: "round",
} as const;

const paths: Record<string, string> = {
  water: "M12 3c3.5 4.5 6 7.6 6 10.5A6 6 0 0 1 6 13.5C6 10.6 8.5 7.5 12 3Z",
  mow: "M3 17h13l3-7h2M5 17a2 2 0 1 0 4 0M13 17a2 2 0 1 0 4 0M6 13h9",
  prep_mow: "M3 17h13l3-7h2M5 17a2 2 0 1 0 4 0M13 17a2 2 0 1 0 4 0M6 13h9",
  feed: "M7 4h10l1 4v12H6V8zM6 8h12M10 13h4",
  leaf_cleanup: "M5 19c0-8 5-13 14-14-1 9-6 14-14 14Zm0 0 7-7",
  check_in_photo: "M4 8.5h3l1.5-2h7l1.5 2h3v11H4zM12 16.5a3 3 0 1 0 0-6 3 3 0 0 0 0 6Z",
  flag_hazards: "M6 21V4M6 4h11l-2 4 2 4H6",
  clear_debris: "M4 20h16M7 20l2-9h6l2 9M10 11V6h4v5",
};

export function StepKindIcon({ kind, className = "size-7" }: { kind: string; className?: string }) {
  return (
    <svg {...common} className={`shrink-0 ${className}`}>
      <path d={paths[kind] ?? "M12 4v9M12 17v.5M12 21a9 9 0 1 1 0-18 9 9 0 0 1 0 18Z"} />
    </svg>
  );
}
