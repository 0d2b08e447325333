import { RightOutlined } from '@ant-design/icons';
import { Alert, Input, Skeleton, Tag, Typography } from 'antd';
import { useDeferredValue, useId, useMemo, useState } from 'react';
import { Link } from 'react-router-dom';
import { paths } from '@/config/paths';
import { palette } from '@/config/theme';
import { useCodeIndex } from '../api/get-code-index';
import { createCodeSearch, entryKey } from '../utils/code-search';

const LIMIT = 8;

/**
 * Instant search over the whole catalogue, in the browser: by code, by words of the title,
 * subsystem or symptoms, forgiving typos ("smal leek").
 */
export function CodeSearch() {
  const id = useId();
  const index = useCodeIndex();
  const [query, setQuery] = useState('');
  const deferred = useDeferredValue(query);
  const search = useMemo(() => (index.data ? createCodeSearch(index.data) : null), [index.data]);
  const results = useMemo(() => (search ? search(deferred, LIMIT) : []), [search, deferred]);
  const text = deferred.trim();

  return (
    <div>
      <label htmlFor={`${id}-input`} style={{ display: 'block', fontWeight: 600, fontSize: 17, marginBottom: 6 }}>
        Search by what it says
      </label>
      <Input
        id={`${id}-input`}
        type="search"
        size="large"
        value={query}
        onChange={(event) => setQuery(event.target.value)}
        placeholder="e.g. very small leak, misfire, lean bank 1"
        autoComplete="off"
        spellCheck={false}
        aria-describedby={`${id}-status`}
        aria-controls={`${id}-results`}
        style={{ maxWidth: 520 }}
      />
      {index.isError && <Alert type="error" showIcon title={`The catalogue could not be loaded: ${index.error.message}`} style={{ marginTop: 12 }} />}
      {index.isPending && text && <Skeleton active paragraph={{ rows: 3 }} title={false} style={{ marginTop: 12 }} />}
      <Typography.Paragraph id={`${id}-status`} type="secondary" aria-live="polite" style={{ margin: '6px 0 0' }}>
        {!text
          ? `Searches ${index.data ? `all ${index.data.length} catalogue entries` : 'the catalogue'} as you type.`
          : search
            ? results.length === 0
              ? `Nothing in the catalogue matches "${text}".`
              : `${results.length === LIMIT ? `The best ${LIMIT}` : results.length} ${results.length === 1 ? 'match' : 'matches'} for "${text}".`
            : ''}
      </Typography.Paragraph>
      <ul id={`${id}-results`} aria-label="Search results" style={{ listStyle: 'none', margin: '8px 0 0', padding: 0 }}>
        {results.map((entry) => (
          <li key={entryKey(entry)} style={{ borderTop: `1px solid ${palette.grey200}` }}>
            <Link
              to={paths.code(entry.code) + (entry.make ? `?make=${encodeURIComponent(entry.make)}` : '')}
              style={{ display: 'flex', alignItems: 'center', gap: 12, padding: '10px 4px', minHeight: 48 }}
            >
              <Typography.Text strong style={{ minWidth: 64, color: palette.teal700 }}>
                {entry.code}
              </Typography.Text>
              <span style={{ flex: 1, color: palette.grey900 }}>
                {entry.title}
                <Typography.Text type="secondary" style={{ display: 'block', fontSize: 14 }}>
                  {entry.subsystem}
                </Typography.Text>
              </span>
              {entry.make && <Tag>{entry.make} only</Tag>}
              <RightOutlined aria-hidden style={{ color: palette.grey600 }} />
            </Link>
          </li>
        ))}
      </ul>
    </div>
  );
}
