import {
  AuditOutlined,
  BookOutlined,
  CarOutlined,
  FileSearchOutlined,
  FormOutlined,
  HistoryOutlined,
  HomeOutlined,
  ImportOutlined,
  LineChartOutlined,
  ShopOutlined,
  TeamOutlined,
  ToolOutlined,
} from '@ant-design/icons';
import type { UserDto } from '@causeway/shared';
import type { MenuProps } from 'antd';
import type { ReactNode } from 'react';
import { SECTION_GROUP_LABELS, SECTIONS, type Section, type SectionGroup, type SectionKey } from '@/config/sections';
import { canAccess } from '@/lib/authorization';

const ICONS: Record<SectionKey, ReactNode> = {
  home: <HomeOutlined aria-hidden />,
  codes: <FileSearchOutlined aria-hidden />,
  jobs: <ToolOutlined aria-hidden />,
  vehicles: <CarOutlined aria-hidden />,
  imports: <ImportOutlined aria-hidden />,
  shop: <ShopOutlined aria-hidden />,
  insights: <LineChartOutlined aria-hidden />,
  reports: <FormOutlined aria-hidden />,
  review: <AuditOutlined aria-hidden />,
  knowledge: <BookOutlined aria-hidden />,
  adminUsers: <TeamOutlined aria-hidden />,
  adminAudit: <HistoryOutlined aria-hidden />,
};

export function sectionIcon(key: SectionKey): ReactNode {
  return ICONS[key];
}

/** The sections this user may open, in navigation order. */
export function visibleSections(user: UserDto): Section[] {
  return SECTIONS.filter((s) => canAccess(user, s.access));
}

type MenuItem = Required<MenuProps>['items'][number];

/** Menu items keyed by path, grouped; a group with nothing to show is left out. */
export function navigationItems(user: UserDto): MenuItem[] {
  const groups = new Map<SectionGroup, Section[]>();
  for (const s of visibleSections(user)) groups.set(s.group, [...(groups.get(s.group) ?? []), s]);
  const items: MenuItem[] = [];
  for (const [group, sections] of groups) {
    const children = sections.map((s) => ({ key: s.path, icon: ICONS[s.key], label: s.label }));
    if (group === 'work') items.push(...children);
    else items.push({ type: 'group', key: `group-${group}`, label: SECTION_GROUP_LABELS[group], children });
  }
  return items;
}

/** The navigation entry that the current address belongs to (the longest matching path). */
export function selectedNavigationKey(pathname: string, user: UserDto): string | undefined {
  return visibleSections(user)
    .map((s) => s.path)
    .filter((path) => (path === '/' ? pathname === '/' : pathname === path || pathname.startsWith(`${path}/`)))
    .sort((a, b) => b.length - a.length)[0];
}
