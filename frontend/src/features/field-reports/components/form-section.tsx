import type { ReactNode } from 'react';

/** A titled group of fields; a fieldset, so screen readers announce the group with each field. */
export function FormSection({ title, children }: { title: string; children: ReactNode }) {
  return (
    <fieldset style={{ border: 0, padding: 0, margin: '0 0 24px', minWidth: 0 }}>
      <legend style={{ fontSize: 20, fontWeight: 600, lineHeight: 1.4, marginBottom: 12, padding: 0, borderBottom: 0 }}>{title}</legend>
      {children}
    </fieldset>
  );
}
