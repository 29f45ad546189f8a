import type { ReactNode } from "react";
import { Link, NavLink } from "react-router-dom";
import { paths } from "../../config/paths";
import { Button } from "../ui/button";
import { Logo } from "../ui/logo";
import { CautionFooter } from "./caution-footer";

export type NavItem = { label: string; to?: string };

type AppLayoutProps = {
  nav: NavItem[];
  user: { name: string; organization: string; role: string };
  onSignOut: () => void;
  signingOut: boolean;
  signOutError?: string | null;
  /** The signed-in person's own settings shown under their name (the units switch). */
  accountControls?: ReactNode;
  /** Screens that put a form and its results side by side use the full width. */
  wide?: boolean;
  children: ReactNode;
};

const itemBase = "flex items-center justify-between rounded-md px-3 py-2 text-sm";

/**
 * The signed-in frame: a left rail (a top block on narrow screens) with the mark, the screens
 * and who is signed in. It knows nothing of permissions: the route decides which items exist.
 */
export function AppLayout({ nav, user, onSignOut, signingOut, signOutError, accountControls, wide = false, children }: AppLayoutProps) {
  return (
    <div className="flex min-h-screen flex-col md:flex-row">
      <a href="#main" className="sr-only rounded-md bg-frost-400 px-3 py-2 text-ink-950 focus:not-sr-only focus:absolute focus:left-2 focus:top-2 focus:z-10">
        Skip to content
      </a>
      <aside className="flex flex-col gap-6 border-b border-ink-800 bg-ink-900 p-4 md:w-60 md:shrink-0 md:border-b-0 md:border-r">
        <Link to={paths.app.overview.getHref()} className="self-start rounded-md" aria-label="Frostfold overview">
          <Logo />
        </Link>
        <nav aria-label="Main">
          <ul className="flex flex-wrap gap-1 md:flex-col">
            {nav.map((item) => (
              <li key={item.label}>
                {item.to ? (
                  <NavLink
                    to={item.to}
                    end
                    className={({ isActive }) =>
                      `${itemBase} ${isActive ? "bg-ink-800 font-semibold text-frost-200 shadow-[inset_3px_0_0] shadow-frost-400" : "text-ink-200 hover:bg-ink-800 hover:text-ink-50"}`
                    }
                  >
                    {item.label}
                  </NavLink>
                ) : (
                  <span className={`${itemBase} cursor-default text-ink-400`} aria-disabled="true">
                    {item.label}
                    <span className="ml-2 rounded border border-ink-600 px-1.5 text-[0.7rem] text-ink-300">soon</span>
                  </span>
                )}
              </li>
            ))}
          </ul>
        </nav>
        <section className="mt-auto space-y-3 border-t border-ink-800 pt-4 text-sm" aria-label="Signed in as">
          <div>
            <p className="font-medium text-ink-50">{user.name}</p>
            <p className="text-ink-300">{user.organization}</p>
            <p className="text-ink-300">
              Role: <span className="font-medium capitalize text-ink-100">{user.role}</span>
            </p>
          </div>
          {accountControls}
          <Button variant="secondary" size="sm" onClick={onSignOut} busy={signingOut}>
            Sign out
          </Button>
          {signOutError ? (
            <p role="alert" className="text-xs text-fault-300">
              Sign-out failed: {signOutError}
            </p>
          ) : null}
        </section>
      </aside>
      <div className="flex min-w-0 flex-1 flex-col">
        <main id="main" tabIndex={-1} className="flex-1 px-4 py-8 sm:px-8">
          <div className={`mx-auto ${wide ? "max-w-[100rem]" : "max-w-5xl"}`}>{children}</div>
        </main>
        <CautionFooter />
      </div>
    </div>
  );
}
