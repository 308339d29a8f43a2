/** Our own simple line icons for the five places in the portal. Decorative: the label carries the meaning. */
const common = {
  viewBox: "0 0 24 24",
  "aria-hidden": true,
  focusable: false,
  className: "size-6 shrink-0",
  fill: "none",
  stroke: "currentColor",
  strokeWidth: 2,
  strokeLinecap: "round",
  strokeLinejoin: "round",
} as const;

export function TodayIcon() {
  return (
    <svg {...common}>
      <circle cx="12" cy="10" r="4" />
      <path d="M12 2v2M4.9 4.9l1.4 1.4M2 10h2M20 10h2M17.7 6.3l1.4-1.4M3 20h18M7 17c1.5-1 3.2-1.5 5-1.5s3.5.5 5 1.5" />
    </svg>
  );
}

export function PlanIcon() {
  return (
    <svg {...common}>
      <rect x="3.5" y="5" width="17" height="15" rx="2" />
      <path d="M3.5 10h17M8 3v4M16 3v4M7.5 14h3M13.5 14h3M7.5 17h3" />
    </svg>
  );
}

export function AskIcon() {
  return (
    <svg {...common}>
      <path d="M4 8.5h3l1.5-2h7l1.5 2h3v11H4z" />
      <circle cx="12" cy="13.5" r="3.2" />
    </svg>
  );
}

export function MessagesIcon() {
  return (
    <svg {...common}>
      <path d="M4 5h12v8H9l-3.5 3v-3H4z" />
      <path d="M16 9h4v8h-1.5v3L15 17h-5v-2" />
    </svg>
  );
}

export function SettingsIcon() {
  return (
    <svg {...common}>
      <path d="M4 7h9M17 7h3M4 17h3M11 17h9" />
      <circle cx="15" cy="7" r="2" />
      <circle cx="9" cy="17" r="2" />
    </svg>
  );
}
