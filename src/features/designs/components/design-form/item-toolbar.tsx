import { Button } from "../../../../components/ui/button";

type ItemToolbarProps = {
  name: string;
  index: number;
  count: number;
  onMove: (from: number, to: number) => void;
  onRemove: (index: number) => void;
  /** Why removing is refused (the last block of a layup), if it is. */
  removeBlocked?: string;
};

/** Move up, move down and remove for one list item; each button names the item it acts on. */
export function ItemToolbar({ name, index, count, onMove, onRemove, removeBlocked }: ItemToolbarProps) {
  return (
    <div className="flex flex-wrap gap-1.5">
      <Button variant="ghost" size="sm" aria-label={`Move ${name} up`} disabled={index === 0} onClick={() => onMove(index, index - 1)}>
        ↑ Up
      </Button>
      <Button variant="ghost" size="sm" aria-label={`Move ${name} down`} disabled={index === count - 1} onClick={() => onMove(index, index + 1)}>
        ↓ Down
      </Button>
      <Button variant="ghost" size="sm" aria-label={`Remove ${name}`} disabled={removeBlocked !== undefined} title={removeBlocked} onClick={() => onRemove(index)}>
        ✕ Remove
      </Button>
    </div>
  );
}
