import { roles, type Role, type UnitSystem } from "@spanwright/contracts";

export const roleLabels: Record<Role, string> = {
  owner: "Project lead",
  engineer: "Engineer",
  checker: "Checker",
  viewer: "Viewer",
};

export const roleDescriptions: Record<Role, string> = {
  owner: "Everything an engineer does, plus members, roles and project settings",
  engineer: "Models beams, runs them and saves revisions",
  checker: "Reviews revisions and marks them checked; cannot edit",
  viewer: "Reads beams and reaction tables, e.g. the foundation designer",
};

export const roleOptions = roles.map((r) => ({ value: r, label: roleLabels[r] }));

export const unitSystemLabels: Record<UnitSystem, string> = {
  si: "SI (m, kN, kN·m)",
  us: "US customary (ft, kip, kip·ft)",
};

export const unitSystemOptions = (Object.keys(unitSystemLabels) as UnitSystem[]).map((u) => ({
  value: u,
  label: unitSystemLabels[u],
}));
