import type { ComponentType } from "react";
import { BoxIcon, BuildingIcon, ChartIcon, ClipboardIcon, HouseIcon, InboxIcon, ToolboxIcon, UserIcon, UsersIcon, type IconProps } from "@/components/ui/icons";
import { paths } from "@/config/paths";
import { canAccess, type Area, type Role } from "@/lib/authorization";

export interface NavItem {
  label: string;
  to: string;
  area: Area;
  icon: ComponentType<IconProps>;
}

export const MAIN_NAV: readonly NavItem[] = [
  { label: "Projects", to: paths.app.projects.getHref(), area: "projects", icon: ClipboardIcon },
  { label: "Customers", to: paths.app.customers.getHref(), area: "customers", icon: HouseIcon },
  { label: "Catalog", to: paths.app.catalog.getHref(), area: "catalog", icon: BoxIcon },
  { label: "Pipeline", to: paths.app.pipeline.getHref(), area: "pipeline", icon: ChartIcon },
  { label: "Jobs", to: paths.app.jobs.getHref(), area: "jobs", icon: ToolboxIcon },
];

export const SETTINGS_NAV: readonly NavItem[] = [
  { label: "My profile", to: paths.app.settings.profile.getHref(), area: "profile", icon: UserIcon },
  { label: "Team", to: paths.app.settings.team.getHref(), area: "team", icon: UsersIcon },
  { label: "Company profile", to: paths.app.settings.company.getHref(), area: "company", icon: BuildingIcon },
  { label: "Outbox", to: paths.app.settings.outbox.getHref(), area: "outbox", icon: InboxIcon },
];

export function navFor(items: readonly NavItem[], role: Role): NavItem[] {
  return items.filter((item) => canAccess(role, item.area));
}
