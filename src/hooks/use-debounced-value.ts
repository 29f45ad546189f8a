import { useEffect, useRef, useState } from "react";

/**
 * The value once it has been still for delay_ms. The first change after a quiet spell passes at
 * once (leading edge), so a single edit repaints without waiting; a burst of typing collapses
 * into its last value.
 */
export function useDebouncedValue<T>(value: T, delay_ms: number): T {
  const [settled, setSettled] = useState(value);
  const lastChange = useRef(Number.NEGATIVE_INFINITY);
  useEffect(() => {
    const now = performance.now();
    const quiet = now - lastChange.current >= delay_ms;
    lastChange.current = now;
    const timer = setTimeout(() => setSettled(value), quiet ? 0 : delay_ms);
    return () => clearTimeout(timer);
  }, [value, delay_ms]);
  return settled;
}
