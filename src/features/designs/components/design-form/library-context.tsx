import { createContext, useContext, type ReactNode } from "react";
import type { ResolvedMaterial } from "../../../../../shared/design/to-assembly";
import type { LibraryPicks } from "../../api/get-library-picks";

/**
 * What the form's library picks offer: today's approved entries, and the exact versions the
 * shown revision used (so an older or retired version still shows its name, not an id).
 */
type Library = { picks: LibraryPicks; known: ResolvedMaterial[] };

const LibraryContext = createContext<Library | null>(null);

export function LibraryProvider({ picks, known, children }: Library & { children: ReactNode }) {
  return <LibraryContext.Provider value={{ picks, known }}>{children}</LibraryContext.Provider>;
}

export function useLibrary(): Library {
  const library = useContext(LibraryContext);
  if (!library) throw new Error("useLibrary needs a LibraryProvider around the design form");
  return library;
}
