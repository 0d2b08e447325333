import { PagePlaceholder } from '@/components/page-placeholder';
import { section } from '@/config/sections';

// Placeholder until this page is built.
export function Component() {
  return <PagePlaceholder section={section('insights')} />;
}
