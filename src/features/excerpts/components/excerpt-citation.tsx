import type { ExcerptDetail } from '@shared/catalogue/types';
import { formatDate } from '@/lib/format';

/** The plain citation line and the contributor's credit; formatted exports come from the cite panel slot. */
export function ExcerptCitation({ excerpt }: { excerpt: ExcerptDetail }) {
  const s = excerpt.source;
  const creators = s.creators.map((c) => c.name).join(' and ');
  const holding = [s.holdingInstitution, s.shelfmark].filter(Boolean).join(', ');
  return (
    <div className="space-y-2 text-sm">
      <p>
        {creators && `${creators}, `}
        <cite className="font-serif text-base">{s.title}</cite> (<span className="figures">{s.date.label}</span>)
        {holding && `, ${holding}`}, <span className="figures">{excerpt.locator.label}</span>.
      </p>
      <p className="text-ink-muted">
        {excerpt.contributor ? `Transcribed by ${excerpt.contributor.displayName}` : 'Transcribed'} ·{' '}
        <span className="figures">
          version {excerpt.version}, {formatDate(excerpt.updatedAt)}
        </span>
        {excerpt.showingApprovedVersion && ' · the approved version; a newer one awaits review'}
      </p>
    </div>
  );
}
