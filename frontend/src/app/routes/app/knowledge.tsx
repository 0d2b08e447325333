import { Tabs } from 'antd';
import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { shopDefaultsFor } from '@/config/locales';
import { section } from '@/config/sections';
import { CausesTable } from '@/features/knowledge-admin/components/causes-table';
import { PartsTable } from '@/features/knowledge-admin/components/parts-table';
import { TeardownsTable } from '@/features/knowledge-admin/components/teardowns-table';
import { KNOWLEDGE_TABS, parseKnowledgeParams, toKnowledgeSearch, type KnowledgeParams } from '@/features/knowledge-admin/utils/params';
import { useCurrentUser } from '@/lib/current-user';
import { browserLocale } from '@/utils/format';

export function Component() {
  const page = section('knowledge');
  const { shop } = useCurrentUser();
  const locale = shop?.locale ?? browserLocale();
  const currency = shop?.currency ?? shopDefaultsFor(locale).currency;
  const [searchParams, setSearchParams] = useSearchParams();
  const params = parseKnowledgeParams(searchParams);
  const set = (next: Partial<KnowledgeParams>) => setSearchParams(toKnowledgeSearch({ ...params, page: 1, ...next }));
  return (
    <>
      <PageHeader
        title={page.label}
        description="Edit the possible causes of each code, the parts and the teardowns directly. Every change is written to the audit log with what it was before."
      />
      <Tabs
        style={{ minWidth: 0 }}
        activeKey={params.tab}
        onChange={(key) => {
          const tab = KNOWLEDGE_TABS.find((t) => t === key) ?? 'causes';
          set({ tab, q: '' });
        }}
        items={[
          {
            key: 'causes',
            label: 'Possible causes',
            children: <CausesTable code={params.code} page={params.page} onCodeChange={(code) => set({ code })} onPageChange={(p) => set({ page: p })} locale={locale} currency={currency} />,
          },
          { key: 'parts', label: 'Parts', children: <PartsTable q={params.q} page={params.page} onQueryChange={(q) => set({ q })} onPageChange={(p) => set({ page: p })} /> },
          {
            key: 'teardowns',
            label: 'Teardowns',
            children: <TeardownsTable q={params.q} page={params.page} onQueryChange={(q) => set({ q })} onPageChange={(p) => set({ page: p })} locale={locale} />,
          },
        ]}
      />
    </>
  );
}
