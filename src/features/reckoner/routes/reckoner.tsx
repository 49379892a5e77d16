import { PageHeader } from '@/components/page-header';
import { CopyLinkButton } from '../components/copy-link';
import { DateSection } from '../components/date-section';
import { PieceSection } from '../components/piece-section';
import { RelativeSizeSection } from '../components/relative-size-section';
import { SoundingSection } from '../components/sounding-section';
import { useReckonerState } from '../lib/state';

/**
 * The Pitch & size reckoner. Everything is computed in the browser with the shared reckoner
 * code (the same code behind /api/reckon/*); the inputs live in the URL so a link shares them.
 */
export function Component() {
  const state = useReckonerState();

  return (
    <div>
      <PageHeader
        eyebrow="Tools"
        title="Pitch & size reckoner"
        description="Work out where an instrument sounds at a historical pitch, which size a source means, which key a piece lies in under the fingers, and what a historical date stands for."
        actions={<CopyLinkButton />}
      />
      <div className="space-y-8">
        <div className="grid gap-8 lg:grid-cols-2">
          <SoundingSection {...state} />
          <RelativeSizeSection {...state} />
        </div>
        <PieceSection {...state} />
        <DateSection {...state} />
      </div>
    </div>
  );
}
