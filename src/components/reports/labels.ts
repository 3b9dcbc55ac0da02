import type { ReportKind, ReportStatus, ShareStatus } from '@/shared/schemas/report';
import type { BadgeTone } from '@/src/components/ui';

/** One plain sentence per kind: who the paper is for and what it is used for. */
export const KIND_PURPOSE: Record<ReportKind, string> = {
  'repair-scope':
    'For the owner: every repair the body needs, structural work first, with hours, timber and cost to budget from.',
  condition:
    'For a buyer: the structural condition of the body in plain words on one or two pages, hiding nothing the repair scope lists as structural.',
};

export const STATUS_LABELS: Record<ReportStatus, string> = {
  queued: 'Waiting to start',
  rendering: 'Being prepared',
  ready: 'Ready',
  failed: 'Could not be prepared',
};

export const STATUS_TONES: Record<ReportStatus, BadgeTone> = {
  queued: 'neutral',
  rendering: 'accent',
  ready: 'ok',
  failed: 'danger',
};

export const SHARE_STATUS_LABELS: Record<ShareStatus, string> = {
  active: 'Open',
  expired: 'Expired',
  revoked: 'Withdrawn',
};

export const SHARE_STATUS_TONES: Record<ShareStatus, BadgeTone> = {
  active: 'ok',
  expired: 'neutral',
  revoked: 'danger',
};

/** "212 KB", "1.4 MB". */
export function formatBytes(bytes: number): string {
  if (bytes < 1024 * 1024) return `${Math.max(1, Math.round(bytes / 1024))} KB`;
  return `${(bytes / (1024 * 1024)).toFixed(1)} MB`;
}

export const pagesLabel = (n: number) => (n === 1 ? '1 page' : `${n} pages`);

/** The file name a browser saves the PDF as. */
export const pdfFileName = (shortId: string, kind: ReportKind, version: number) =>
  `${shortId}-${kind}-v${version}.pdf`;
