import { useEffect, useId, useRef, useState, type ReactNode } from "react";
import { Link, NavLink, useLocation } from "react-router-dom";
import { SproutMark } from "./sprout-mark.tsx";
import { TitleSuffixContext } from "./use-document-title.ts";

export interface NavItem {
  to: string;
  label: string;
  /** Match only this exact path (for the home link). */
  end?: boolean;
}

export interface AppShellProps {
  /** Shown next to the mark and used as the tab-title suffix, e.g. "Sproutline Staff". */
  productLabel: string;
  /** Where the mark links to, relative to the router basename. */
  homeTo?: string;
  /** Main navigation; collapses behind a menu button on narrow screens. */
  nav?: NavItem[];
  /** Account controls (name, sign out): in the header, or in the menu when there is a nav. */
  actions?: ReactNode;
  children: ReactNode;
}

/** Skip link, header, navigation and the <main> landmark shared by both apps. */
export function AppShell({ productLabel, homeTo = "/", nav, actions, children }: AppShellProps) {
  const mainRef = useFocusMainOnNavigate();
  const menuId = useId();
  const { pathname } = useLocation();
  // The menu remembers the page it was opened on, so it closes by itself after navigating.
  const [menuOpenedOn, setMenuOpenedOn] = useState<string | null>(null);
  const menuOpen = menuOpenedOn === pathname;

  const hasMenu = Boolean(nav?.length);

  return (
    <TitleSuffixContext value={productLabel}>
      <div className="flex min-h-dvh flex-col">
        <a
          href="#main"
          className="sr-only rounded-lg bg-surface px-4 py-3 font-semibold focus:not-sr-only focus:absolute focus:top-2 focus:left-2 focus:z-50"
        >
          Skip to main content
        </a>
        <header className="border-b border-line bg-surface">
          <div className="mx-auto flex max-w-5xl flex-wrap items-center gap-x-4 gap-y-2 px-4 py-2">
            <Link
              to={homeTo}
              className="flex min-h-11 items-center gap-2 font-heading text-xl font-bold text-pine-900 no-underline"
            >
              <SproutMark />
              {productLabel}
            </Link>

            {hasMenu ? (
              <>
                <button
                  type="button"
                  className="ml-auto inline-flex min-h-11 items-center gap-2 rounded-lg border-2 border-pine-700 px-4 font-semibold text-pine-700 md:hidden"
                  aria-expanded={menuOpen}
                  aria-controls={menuId}
                  onClick={() => setMenuOpenedOn(menuOpen ? null : pathname)}
                >
                  <MenuIcon open={menuOpen} />
                  Menu
                </button>
                <div
                  id={menuId}
                  className={`${menuOpen ? "flex" : "hidden"} w-full flex-col gap-2 pb-2 md:flex md:w-full md:flex-row md:items-center md:pb-1`}
                >
                  <nav aria-label="Main" className="md:flex-1">
                    <ul className="flex flex-col gap-1 md:flex-row md:flex-wrap">
                      {nav!.map((item) => (
                        <li key={item.to}>
                          <NavLink
                            to={item.to}
                            end={item.end}
                            className="flex min-h-11 items-center rounded-lg px-3 font-semibold whitespace-nowrap text-ink no-underline hover:bg-pine-50 aria-[current=page]:bg-pine-100 aria-[current=page]:text-pine-900"
                          >
                            {item.label}
                          </NavLink>
                        </li>
                      ))}
                    </ul>
                  </nav>
                  {actions && <div className="flex flex-wrap items-center gap-2 border-t border-line pt-2 md:border-0 md:pt-0">{actions}</div>}
                </div>
              </>
            ) : (
              actions && <div className="ml-auto flex items-center gap-2">{actions}</div>
            )}
          </div>
        </header>

        <main id="main" ref={mainRef} tabIndex={-1} className="flex-1 px-4 py-6 focus:outline-none sm:py-10">
          {children}
        </main>
      </div>
    </TitleSuffixContext>
  );
}

/** After an in-app navigation, move focus to <main> so keyboard and screen-reader users start at the new page. */
function useFocusMainOnNavigate() {
  const mainRef = useRef<HTMLElement>(null);
  const { pathname } = useLocation();
  const firstRender = useRef(true);
  useEffect(() => {
    if (firstRender.current) {
      firstRender.current = false;
      return;
    }
    mainRef.current?.focus({ preventScroll: false });
  }, [pathname]);
  return mainRef;
}

function MenuIcon({ open }: { open: boolean }) {
  return (
    <svg viewBox="0 0 24 24" aria-hidden="true" focusable="false" className="size-5" fill="none" stroke="currentColor" strokeWidth="2.5" strokeLinecap="round">
      {open ? <path d="M6 6l12 12M18 6 6 18" /> : <path d="M4 7h16M4 12h16M4 17h16" />}
    </svg>
  );
}
