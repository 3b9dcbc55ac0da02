/**
 * The contract between the report job (server/services/reports.ts, server/jobs/report-queue.ts)
 * and the PDF renderer (server/reports/render.ts): the job collects a snapshot, the renderer
 * turns it into bytes, reporting progress as it goes.
 */
import type { ReportSnapshot } from '@/shared/reports/types';
import type { ReportSummary } from '@/shared/schemas/report';

export interface RenderIdentity {
  /** Printed in every page footer, e.g. 'SF-7K3M-Q9TD'. */
  shortId: string;
  version: number;
  /** Where a reader checks the report (`<public URL>/verify`), printed on the cover; null when unknown. */
  verifyUrl?: string | null;
}

export interface RenderDeps {
  /** The photo's display rendition (JPEG ≤ 1600 px), or null when it is gone from storage. */
  loadPhoto(photoId: string): Promise<Buffer | null>;
}

/** progress 0–100 and what is being done, in plain words ('Drawing the body diagram'). */
export type RenderProgress = (progress: number, stage: string) => void | Promise<void>;

export interface RenderedReport {
  pdf: Buffer;
  pageCount: number;
  /** What the share and verification pages may show (the same numbers the PDF prints). */
  summary: ReportSummary;
  /** Distinct photos embedded (each once). */
  photoCount: number;
}

export type RenderReport = (
  snapshot: ReportSnapshot,
  identity: RenderIdentity,
  deps: RenderDeps,
  onProgress: RenderProgress,
) => Promise<RenderedReport>;
