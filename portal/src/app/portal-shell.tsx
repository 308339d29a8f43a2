import { useEffect, useRef, type ReactNode } from "react";
import { useTranslation } from "react-i18next";
import { Link, NavLink, useLocation } from "react-router-dom";
import { SproutMark } from "#shared/ui/index";
import { AskIcon, MessagesIcon, PlanIcon, SettingsIcon, TodayIcon } from "./nav-icons.tsx";
import { productLabel } from "./product.ts";

const navItems = [
  { to: "/", key: "today", end: true, Icon: TodayIcon },
  { to: "/plan", key: "plan", end: false, Icon: PlanIcon },
  { to: "/ask", key: "ask", end: false, Icon: AskIcon },
  { to: "/messages", key: "messages", end: false, Icon: MessagesIcon },
  { to: "/settings", key: "settings", end: false, Icon: SettingsIcon },
] as const;

export interface PortalShellProps {
  /** Account controls for the header (sign out). */
  actions?: ReactNode;
  /** False on the sign-in pages: there is nowhere to go yet. */
  showNav?: boolean;
  /** The homeowner's company (logo and name) in place of the product's mark, once known. */
  brand?: ReactNode;
  /** A strip under the header (the office's call and text links). */
  headerStrip?: ReactNode;
  /** New messages from the company, shown on the Messages tab. */
  unreadMessages?: number;
  children: ReactNode;
}

/**
 * The homeowner's frame. On a phone the five places sit in a bar at the bottom, where a
 * thumb reaches them; from tablet width they move into the header.
 */
export function PortalShell({ actions, showNav = true, brand, headerStrip, unreadMessages = 0, children }: PortalShellProps) {
  const { t } = useTranslation();
  const mainRef = useFocusMainOnNavigate();

  const links = (placement: "top" | "bottom") =>
    navItems.map(({ to, key, end, Icon }) => (
      <li key={to} className={placement === "bottom" ? "flex-1" : undefined}>
        <NavLink
          to={to}
          end={end}
          // The badge is drawn for the eye; the name says it for screen readers ("Messages, 2 new").
          aria-label={key === "messages" && unreadMessages > 0 ? t("nav.messagesUnread", { count: unreadMessages }) : undefined}
          className={
            placement === "bottom"
              ? "flex min-h-14 flex-col items-center justify-center gap-0.5 px-1 text-sm font-semibold text-ink no-underline aria-[current=page]:bg-pine-100 aria-[current=page]:text-pine-900"
              : "flex min-h-11 items-center gap-2 rounded-lg px-3 font-semibold text-ink no-underline hover:bg-pine-50 aria-[current=page]:bg-pine-100 aria-[current=page]:text-pine-900"
          }
        >
          <span className="relative">
            <Icon />
            {key === "messages" && unreadMessages > 0 && <UnreadBadge count={unreadMessages} />}
          </span>
          {t(`nav.${key}`)}
        </NavLink>
      </li>
    ));

  return (
    <div className="flex min-h-dvh flex-col">
      <a
        href="#main"
        className="sr-only rounded-lg bg-surface px-4 py-3 font-semibold focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50"
      >
        {t("shell.skipLink")}
      </a>
      <header className="border-b border-line bg-surface print:hidden">
        <div className="mx-auto flex max-w-5xl items-center gap-4 px-4 py-2">
          <Link to="/" className="flex min-h-11 min-w-0 items-center gap-2 font-heading text-xl font-bold text-pine-900 no-underline">
            {brand ?? (
              <>
                <SproutMark />
                {productLabel}
              </>
            )}
          </Link>
          {showNav && (
            <nav aria-label={t("shell.navLabel")} className="hidden flex-1 md:block">
              <ul className="flex gap-1">{links("top")}</ul>
            </nav>
          )}
          {actions && <div className="ml-auto flex shrink-0 items-center gap-2">{actions}</div>}
        </div>
        {headerStrip}
      </header>

      <main
        id="main"
        ref={mainRef}
        tabIndex={-1}
        className={`flex-1 px-4 py-6 focus:outline-none sm:py-10 print:p-0 ${showNav ? "pb-28 md:pb-10" : ""}`}
      >
        {children}
      </main>

      {showNav && (
        // A second landmark with its own name: screen readers list "Main" and "Places" apart.
        <nav aria-label={t("shell.bottomNavLabel")} className="fixed inset-x-0 bottom-0 z-40 border-t border-line-strong bg-surface md:hidden print:hidden">
          <ul className="mx-auto flex max-w-xl pb-[env(safe-area-inset-bottom)]">{links("bottom")}</ul>
        </nav>
      )}
    </div>
  );
}

/** A small count on the Messages icon; hidden from screen readers, the link's name carries it. */
function UnreadBadge({ count }: { count: number }) {
  return (
    <span
      aria-hidden="true"
      data-testid="unread-badge"
      className="absolute -top-1.5 -right-2.5 min-w-5 rounded-full bg-rust-700 px-1 text-center text-xs leading-5 font-bold text-white"
    >
      {count > 9 ? "9+" : count}
    </span>
  );
}

/** After an in-app navigation, move focus to <main> so keyboard and screen-reader users start at the new page. */
function useFocusMainOnNavigate() {
  const mainRef = useRef<HTMLElement>(null);
  const { pathname } = useLocation();
  // Compared with the last path rather than a "first render" flag, so StrictMode's
  // double effect run (and remounts) don't steal focus on the first page.
  const shownPath = useRef(pathname);
  useEffect(() => {
    if (shownPath.current === pathname) return;
    shownPath.current = pathname;
    mainRef.current?.focus();
  }, [pathname]);
  return mainRef;
}
