import type { Section } from '@/config/sections';
import { PageHeader } from './page-header';

type PagePlaceholderProps = { section: Section };

/** Stands in for a page that is still being built: its name and what it is for, nothing invented. */
export function PagePlaceholder({ section }: PagePlaceholderProps) {
  return <PageHeader title={section.label} description={section.purpose} />;
}
