import { NavLink } from "react-router-dom";
import { paths } from "../../../config/paths";
import { useCan } from "../../../lib/can";

const tab = ({ isActive }: { isActive: boolean }) =>
  `rounded-md px-3 py-1.5 text-sm ${isActive ? "bg-ink-800 font-semibold text-frost-200 underline decoration-frost-400 underline-offset-4" : "text-ink-200 hover:bg-ink-800 hover:text-ink-50"}`;

/** The library's own screens; the active one is underlined as well as tinted. */
export function LibraryNav() {
  const canPropose = useCan("propose:material");
  return (
    <nav aria-label="Library" className="mb-6 flex flex-wrap gap-1 border-b border-ink-800 pb-3">
      <NavLink to={paths.app.library.getHref()} end className={tab}>Materials</NavLink>
      <NavLink to={paths.app.cryogens.getHref()} end className={tab}>Cryogens</NavLink>
      {canPropose ? <NavLink to={paths.app.libraryImport.getHref()} end className={tab}>Import CSV</NavLink> : null}
    </nav>
  );
}
