import { useRef, useState, type CSSProperties, type KeyboardEvent } from 'react';
import type { DecadeCount } from '@shared/insights/schema';
import { cn } from '@/lib/cn';
import { decadeLabel } from '../lib/filters';

export interface DecadeStripProps {
  decades: readonly DecadeCount[];
  onChoose: (decade: number) => void;
  selected?: number | null;
  /** What choosing does, for the accessible name: "search" or "narrow the search to". */
  verb: string;
  className?: string;
  style?: CSSProperties;
}

/**
 * One button per decade, laid over the decade bars (same columns as the year axis):
 * a click on a bar, or Enter/Space on the focused decade, chooses it. A single tab
 * stop; the arrow keys, Home and End move between decades.
 */
export function DecadeStrip({ decades, onChoose, selected, verb, className, style }: DecadeStripProps) {
  const refs = useRef<(HTMLButtonElement | null)[]>([]);
  const start = Math.max(0, decades.findIndex((d) => d.decade === selected || (selected == null && d.count > 0)));
  const [active, setActive] = useState(start);
  const current = Math.min(active, decades.length - 1);

  const move = (event: KeyboardEvent, to: number) => {
    event.preventDefault();
    const next = Math.max(0, Math.min(decades.length - 1, to));
    setActive(next);
    refs.current[next]?.focus();
  };
  const onKeyDown = (event: KeyboardEvent<HTMLDivElement>) => {
    if (event.key === 'ArrowRight' || event.key === 'ArrowDown') move(event, current + 1);
    else if (event.key === 'ArrowLeft' || event.key === 'ArrowUp') move(event, current - 1);
    else if (event.key === 'Home') move(event, 0);
    else if (event.key === 'End') move(event, decades.length - 1);
  };

  return (
    <div
      role="toolbar"
      aria-label={`Decades: choose one to ${verb} it`}
      aria-orientation="horizontal"
      onKeyDown={onKeyDown}
      className={cn('grid', className)}
      style={{ gridTemplateColumns: `repeat(${decades.length}, minmax(0, 1fr))`, ...style }}
    >
      {decades.map((d, i) => (
        <button
          key={d.decade}
          ref={(el) => {
            refs.current[i] = el;
          }}
          type="button"
          tabIndex={i === current ? 0 : -1}
          aria-pressed={selected === d.decade}
          aria-label={`${decadeLabel(d.decade)}: ${d.count} ${d.count === 1 ? 'excerpt' : 'excerpts'}`}
          title={`${decadeLabel(d.decade)}: ${d.count} — ${verb} ${d.decade}–${d.decade + 9}`}
          onFocus={() => setActive(i)}
          onClick={() => onChoose(d.decade)}
          className={cn(
            'h-full min-w-0 cursor-pointer rounded-[2px] bg-transparent hover:bg-accent/10 focus-visible:bg-accent/10',
            selected === d.decade && 'bg-accent/15 ring-1 ring-accent',
          )}
        />
      ))}
    </div>
  );
}
