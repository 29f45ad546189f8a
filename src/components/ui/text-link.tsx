import { Link, type LinkProps } from "react-router-dom";

export const linkClass = "font-medium text-frost-300 underline decoration-frost-700 underline-offset-4 hover:decoration-frost-300";

/** In-app link with Frostfold's link look; underlined so it is not told apart by colour alone. */
export function TextLink({ className = "", ...props }: LinkProps) {
  return <Link className={`${linkClass} ${className}`} {...props} />;
}
