import { Role } from '@nappe/shared';
import { paths } from '../../config/paths';

export interface NavLinkItem {
  label: string;
  to: string;
}

export interface NavSection {
  label: string;
  /** Who sees the section (DESIGN.md: staff see Today, Prep, Allergy notes and Kitchen). */
  roles: readonly Role[];
  /** A section with no link yet is not built: it stays out of the menu rather than dead. */
  to?: string;
  children?: NavLinkItem[];
}

const ALL_TEAM = [Role.Chef, Role.Staff] as const;
const CHEF = [Role.Chef] as const;

export const NAV_SECTIONS: readonly NavSection[] = [
  { label: 'Today', roles: ALL_TEAM, to: paths.today.getHref() },
  { label: 'Orders', roles: CHEF, to: paths.orders.getHref() },
  { label: 'Calendar', roles: CHEF, to: paths.calendar.getHref() },
  {
    label: 'Kitchen',
    roles: ALL_TEAM,
    children: [
      { label: 'Ingredients', to: paths.ingredients.getHref() },
      { label: 'Recipes', to: paths.recipes.getHref() },
      { label: 'Desserts', to: paths.desserts.getHref() },
      { label: 'Menus', to: paths.menus.getHref() },
    ],
  },
  {
    label: 'Prep',
    roles: ALL_TEAM,
    children: [
      { label: 'Plan', to: paths.prepPlan.getHref() },
      { label: 'Schedule', to: paths.prepSchedule.getHref() },
      { label: 'Labels', to: paths.prepLabels.getHref() },
    ],
  },
  { label: 'Allergy notes', roles: ALL_TEAM, to: paths.allergyNotes.getHref() },
  {
    label: 'Studio',
    roles: CHEF,
    children: [
      { label: 'Settings', to: paths.settings.getHref() },
      { label: 'Team', to: paths.team.getHref() },
    ],
  },
  { label: 'Insights', roles: CHEF, to: paths.insights.getHref() },
];

/** The sections this role may open that exist today. */
export function sectionsFor(role: Role): NavSection[] {
  return NAV_SECTIONS.filter(
    (section) =>
      section.roles.includes(role) && (section.to !== undefined || !!section.children?.length),
  );
}
