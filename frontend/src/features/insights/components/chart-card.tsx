import { Card, Empty, Segmented } from 'antd';
import { useState, type ReactNode } from 'react';

type ChartCardProps = {
  title: string;
  /** One or two sentences saying what the chart shows; also the chart's text alternative. */
  summary: string;
  chart: ReactNode;
  table: ReactNode;
  empty?: boolean;
  emptyText?: string;
};

type View = 'chart' | 'table';

/** A chart with its table beside it, one click away, and a sentence that says what it shows. */
export function ChartCard({ title, summary, chart, table, empty = false, emptyText = 'Nothing to show yet' }: ChartCardProps) {
  const [view, setView] = useState<View>('chart');
  return (
    <Card
      title={<h2 style={{ fontSize: 20, margin: 0 }}>{title}</h2>}
      extra={
        !empty && (
          <Segmented<View>
            aria-label={`Show ${title.toLowerCase()} as`}
            value={view}
            onChange={setView}
            options={[
              { value: 'chart', label: 'Chart' },
              { value: 'table', label: 'Table' },
            ]}
          />
        )
      }
      style={{ height: '100%' }}
    >
      <p style={{ marginTop: 0 }}>{summary}</p>
      {empty ? (
        <Empty description={emptyText} image={Empty.PRESENTED_IMAGE_SIMPLE} />
      ) : view === 'chart' ? (
        <div role="img" aria-label={summary} style={{ width: "100%", minWidth: 0, height: 320, overflow: "hidden" }}>
          {chart}
        </div>
      ) : (
        table
      )}
    </Card>
  );
}
