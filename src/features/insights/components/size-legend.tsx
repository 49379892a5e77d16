import type { ReactNode } from 'react';
import { cn } from '@/lib/cn';
import type { SizeStyle, SymbolName } from '../lib/size-styles';

/** The marker shapes the charts use, drawn in a 12 × 12 box. */
const shapes: Record<SymbolName, { d: string; stroked?: boolean }> = {
  circle: { d: 'M6 1.5a4.5 4.5 0 1 0 0.001 0Z' },
  square: { d: 'M2 2h8v8H2Z' },
  triangle: { d: 'M6 1.2 10.8 10H1.2Z' },
  triangle2: { d: 'M6 1.8 10.3 9.6H1.7Z', stroked: true },
  diamond: { d: 'M6 .8 11.2 6 6 11.2.8 6Z' },
  cross: { d: 'M4.5 1h3v3.5H11v3H7.5V11h-3V7.5H1v-3h3.5Z' },
  times: { d: 'M2 2l8 8M10 2l-8 8', stroked: true },
  star: { d: 'M6 .8l1.5 3.5 3.8.3-2.9 2.5.9 3.7L6 8.8l-3.3 2 .9-3.7L.7 4.6l3.8-.3Z' },
  wye: { d: 'M4.7 1h2.6v4.2l3.6 2.1-1.3 2.2L6 7.4 2.4 9.5 1.1 7.3l3.6-2.1Z' },
  hexagon: { d: 'M6 .8 10.5 3.4v5.2L6 11.2 1.5 8.6V3.4Z' },
  asterisk: { d: 'M6 1v10M1.7 3.5l8.6 5M1.7 8.5l8.6-5', stroked: true },
};

export function SizeMark({ style, className }: { style: SizeStyle; className?: string }) {
  const shape = shapes[style.symbol];
  return (
    <svg viewBox="0 0 12 12" width="14" height="14" aria-hidden="true" className={cn('inline-block size-3.5 shrink-0', className)}>
      <path
        d={shape.d}
        fill={shape.stroked ? 'none' : style.color}
        stroke={style.color}
        strokeWidth={shape.stroked ? 1.8 : 0.8}
        strokeLinecap="round"
      />
    </svg>
  );
}

/** The key to a chart's sizes: shape, colour and name together. */
export function SizeLegend({ styles, extra }: { styles: readonly SizeStyle[]; extra?: ReactNode }) {
  if (!styles.length && !extra) return null;
  return (
    <ul aria-label="Key" className="flex flex-wrap gap-x-4 gap-y-1 text-sm text-ink-muted">
      {styles.map((s) => (
        <li key={s.key} className="inline-flex items-center gap-1.5">
          <SizeMark style={s} />
          <span>
            {s.label} <span className="figures text-ink-faint">({s.short})</span>
          </span>
        </li>
      ))}
      {extra}
    </ul>
  );
}
