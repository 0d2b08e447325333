import type { PartDto, PossibleCauseRowDto } from '@causeway/shared';
import type { SelectProps } from 'antd';

interface Option {
  value: string;
  label: string;
}

/** Parts for a select: the code's possible causes first, then every other part. */
export function partOptions(parts: PartDto[], causes: PossibleCauseRowDto[], code: string | null): NonNullable<SelectProps['options']> {
  const listed = new Set(causes.map((c) => c.partKey));
  const name = new Map(parts.map((p) => [p.key, p.name]));
  const first: Option[] = [...listed].map((key) => ({ value: key, label: name.get(key) ?? causes.find((c) => c.partKey === key)?.partName ?? key }));
  const rest: Option[] = parts.filter((p) => !listed.has(p.key)).map((p) => ({ value: p.key, label: p.name }));
  first.sort((a, b) => a.label.localeCompare(b.label));
  rest.sort((a, b) => a.label.localeCompare(b.label));
  if (first.length === 0) return rest;
  return [
    { label: `Possible causes of ${code ?? 'the code'}`, title: 'possible-causes', options: first },
    { label: 'Other parts', title: 'other-parts', options: rest },
  ];
}
