import type { Facsimile, User } from '../models';
import type { FacsimileView } from '@shared/catalogue/types';
import { presentCredit } from './user';

export function presentFacsimile(facsimile: Facsimile & { uploadedBy?: Pick<User, 'id' | 'displayName'> }, sourcePublicId: string): FacsimileView {
  return {
    id: facsimile.id,
    sourceId: sourcePublicId,
    originalName: facsimile.originalName,
    mediaType: facsimile.mediaType,
    byteSize: Number(facsimile.byteSize),
    sha256: facsimile.sha256,
    pageCount: facsimile.pageCount,
    extractionStatus: facsimile.extractionStatus,
    extractionProgress: facsimile.extractionProgress,
    extractionError: facsimile.extractionError,
    fileUrl: `/api/facsimiles/${facsimile.id}/file`,
    uploadedBy: presentCredit(facsimile.uploadedBy),
    createdAt: facsimile.createdAt.toISOString(),
  };
}
