import type { Role } from "../../../../shared/permissions";

/** Plain words for each role, shown beside role pickers so nobody picks by name alone. */
export const ROLE_LABELS: Record<Role, string> = {
  owner: "Owner",
  engineer: "Engineer",
  technician: "Technician",
  viewer: "Viewer",
};

export const ROLE_SUMMARIES: Record<Role, string> = {
  owner: "Everything, including the team, settings and approving library entries.",
  engineer: "Edits designs, proposes library entries and logs tests.",
  technician: "Logs boil-off tests and comments on them.",
  viewer: "Reads designs, the library and tests.",
};
