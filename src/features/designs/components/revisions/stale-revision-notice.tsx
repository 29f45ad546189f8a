import { Button } from "../../../../components/ui/button";
import { Callout } from "../../../../components/ui/callout";
import { linkClass } from "../../../../components/ui/text-link";

/**
 * Someone saved a newer revision while this one was being edited. The edits stay on screen; the
 * newest can be read in another tab and merged by hand, or loaded here instead of the edits.
 */
export function StaleRevisionNotice({ message, newestHref, onReload }: { message: string; newestHref: string; onReload: () => void }) {
  return (
    <Callout tone="warning" title="Not saved: a newer revision exists">
      <p>{message}</p>
      <p className="mt-1">Your edits are still here, unsaved.</p>
      <div className="mt-2 flex flex-wrap items-center gap-3">
        <a href={newestHref} target="_blank" rel="noopener" className={linkClass}>
          Open the newest revision in a new tab
        </a>
        <Button variant="secondary" size="sm" onClick={onReload}>
          Load the newest here (drops your edits)
        </Button>
      </div>
    </Callout>
  );
}
