import type { ReactNode } from "react";
import { Link } from "react-router-dom";
import { paths } from "../../config/paths";
import { Logo } from "../ui/logo";
import { CautionFooter } from "./caution-footer";

/** The signed-out frame: the mark, one narrow card, and the caution line. */
export function AuthLayout({ title, intro, children }: { title: string; intro?: ReactNode; children: ReactNode }) {
  return (
    <div className="flex min-h-screen flex-col bg-ink-950">
      <main className="flex flex-1 flex-col items-center px-4 py-12 sm:py-20">
        <Link to={paths.app.overview.getHref()} className="rounded-md" aria-label="Frostfold home">
          <Logo />
        </Link>
        <div className="mt-8 w-full max-w-md rounded-lg border border-ink-700 bg-ink-900 p-6 shadow-lg shadow-black/40 sm:p-8">
          <h1 className="text-xl font-semibold text-ink-50">{title}</h1>
          {intro ? <div className="mt-2 text-sm text-ink-300">{intro}</div> : null}
          <div className="mt-6">{children}</div>
        </div>
      </main>
      <CautionFooter />
    </div>
  );
}
