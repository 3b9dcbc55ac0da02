import { z } from 'zod';
import { emailSchema } from './auth';
import { isoDateTime, uuid } from './common';

export const REPORT_KINDS = ['repair-scope', 'condition'] as const;
export type ReportKind = (typeof REPORT_KINDS)[number];
export const REPORT_KIND_LABELS: Record<ReportKind, string> = {
  'repair-scope': 'Repair scope',
  condition: 'Buyer’s condition report',
};

export const PAPER_SIZES = ['A4', 'Letter'] as const;
export type PaperSize = (typeof PAPER_SIZES)[number];

/** queued → rendering → ready | failed. */
export const REPORT_STATUSES = ['queued', 'rendering', 'ready', 'failed'] as const;
export type ReportStatus = (typeof REPORT_STATUSES)[number];

export const CONDITION_GRADES = [
  'sound',
  'serviceable',
  'needs-repair',
  'major-repair',
  'rebuild',
] as const;
export type ConditionGrade = (typeof CONDITION_GRADES)[number];

/** PRODUCT.md §4 item 10: the condition summary, with our own grade wording (shared/reports/condition.ts). */
export const conditionSummarySchema = z.object({
  grade: z.enum(CONDITION_GRADES),
  gradeLabel: z.string(),
  /** 1 (best) … 5 (worst), printed as "3 of 5". */
  gradeRank: z.number(),
  gradeText: z.string(),
  primaryMembers: z.number(),
  primarySound: z.number(),
  /** primarySound / primaryMembers, 0–1. */
  primarySoundShare: z.number(),
  countsByClass: z.object({
    'structural-must-fix': z.number(),
    cosmetic: z.number(),
    monitor: z.number(),
  }),
  /** Zones with open findings of severity ≥ 2 that have no member decision yet. */
  undecidedZones: z.number(),
  activeZones: z.number(),
  watchedZones: z.number(),
});
export type ConditionSummary = z.infer<typeof conditionSummarySchema>;

const notInspectedItem = z.object({ date: z.string(), what: z.string() });

/**
 * What the share page and the verification page may show of a report: stored on the report
 * row at generation (the same numbers the PDF prints), never the workshop's other records.
 */
export const reportSummarySchema = z.object({
  kind: z.enum(REPORT_KINDS),
  title: z.string(),
  workshopName: z.string(),
  vehicleTitle: z.string(),
  inspectorName: z.string().nullable(),
  latestSurveyDate: z.string().nullable(),
  condition: conditionSummarySchema,
  mustFix: z.array(z.object({ zoneLabel: z.string(), verdictLabel: z.string() })),
  infestations: z.array(z.object({ zoneLabel: z.string(), stateLabel: z.string() })),
  notInspected: z.array(notInspectedItem),
  /** Repair scope only: total cost and hours; null on the buyer's report. */
  totals: z.object({ hours: z.number(), totalCost: z.number(), currency: z.string() }).nullable(),
  /** The body drawing the PDF shows: the plan and, for zones with open findings, worst severity and count. */
  diagram: z
    .object({
      bodyPlanKey: z.string(),
      zones: z.record(z.string(), z.object({ worstSeverity: z.number(), count: z.number() })),
    })
    .nullable()
    .default(null),
});
export type ReportSummary = z.infer<typeof reportSummarySchema>;

/** POST /api/workshops/:wid/vehicles/:vid/reports → 202 reportResponse (generation is queued). */
export const createReportRequest = z.object({
  id: uuid.optional(),
  kind: z.enum(REPORT_KINDS),
});
export type CreateReportRequest = z.input<typeof createReportRequest>;

export const reportResponse = z.object({
  id: uuid,
  vehicleId: uuid,
  kind: z.enum(REPORT_KINDS),
  /** 1, 2, … per (vehicle, kind). */
  version: z.number(),
  /** Printed on every page, e.g. 'SF-7K3M-Q9TD'. */
  shortId: z.string(),
  status: z.enum(REPORT_STATUSES),
  /** 0–100 while queued/rendering; 100 when ready. */
  progress: z.number(),
  /** What the job is doing, in plain words ('Drawing the body diagram'). */
  stage: z.string(),
  error: z.string().nullable(),
  sha256: z.string().nullable(),
  byteSize: z.number().nullable(),
  pageCount: z.number().nullable(),
  summary: reportSummarySchema.nullable(),
  /** Authorized download URL once ready. */
  pdfUrl: z.string().nullable(),
  /** True for the newest version of its kind on this vehicle. */
  latest: z.boolean(),
  createdByName: z.string().nullable(),
  createdAt: isoDateTime,
  finishedAt: isoDateTime.nullable(),
});
export type ReportResponse = z.infer<typeof reportResponse>;

export const SHARE_STATUSES = ['active', 'expired', 'revoked'] as const;
export type ShareStatus = (typeof SHARE_STATUSES)[number];

/** POST /api/workshops/:wid/reports/:rid/shares — a link, e-mailed when a recipient is given. */
export const createShareRequest = z.object({
  expiresInDays: z.number().int().min(1, 'At least one day').max(90, 'At most 90 days').default(14),
  recipientEmail: emailSchema.nullable().default(null),
  message: z.string().trim().max(1000).default(''),
});
export type CreateShareRequest = z.input<typeof createShareRequest>;

export const shareResponse = z.object({
  id: uuid,
  reportId: uuid,
  recipientEmail: z.string().nullable(),
  expiresAt: isoDateTime,
  revokedAt: isoDateTime.nullable(),
  status: z.enum(SHARE_STATUSES),
  viewCount: z.number(),
  lastViewedAt: isoDateTime.nullable(),
  /** Downloads of the PDF through the link (the page and the file are counted apart). */
  downloadCount: z.number(),
  lastDownloadedAt: isoDateTime.nullable(),
  emailedAt: isoDateTime.nullable(),
  createdByName: z.string().nullable(),
  createdAt: isoDateTime,
});
export type ShareResponse = z.infer<typeof shareResponse>;

/** The only answer that carries the token (only its SHA-256 is stored). */
export const createShareResponse = shareResponse.extend({ token: z.string(), url: z.string() });
export type CreateShareResponse = z.infer<typeof createShareResponse>;

/** GET /api/public/shares/:token — counts a view; unknown, expired, revoked → the same 404. */
export const publicShareResponse = z.object({
  report: z.object({
    kind: z.enum(REPORT_KINDS),
    version: z.number(),
    shortId: z.string(),
    generatedAt: isoDateTime,
    sha256: z.string(),
    pageCount: z.number(),
    byteSize: z.number(),
    newerVersionExists: z.boolean(),
  }),
  summary: reportSummarySchema,
  expiresAt: isoDateTime,
  pdfUrl: z.string(),
});
export type PublicShareResponse = z.infer<typeof publicShareResponse>;

/** GET /api/public/verify/:shortId, or POST /api/public/verify with the PDF (multipart field `pdf`). */
export const verifyResponse = z.object({
  genuine: z.boolean(),
  /** 'hash' when the bytes matched a stored report, 'id' when only the identifier was looked up. */
  matchedBy: z.enum(['hash', 'id']).nullable(),
  /**
   * A file that matches nothing but names an issued report: the identifier it claims (so the page
   * can say "changed" rather than "never issued"). Null otherwise.
   */
  claimedShortId: z.string().nullable(),
  report: z
    .object({
      shortId: z.string(),
      kind: z.enum(REPORT_KINDS),
      version: z.number(),
      latestVersion: z.number(),
      newerVersionExists: z.boolean(),
      generatedAt: isoDateTime,
      sha256: z.string(),
      workshopName: z.string(),
    })
    .nullable(),
  /** Plain words for the page: what was checked and what it means. */
  message: z.string(),
});
export type VerifyResponse = z.infer<typeof verifyResponse>;

/** Short identifiers: 'SF-' + 8 Crockford base-32 characters in two groups. */
export const SHORT_ID_PATTERN = /^SF-[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}$/;
export const shortIdParam = z
  .string()
  .trim()
  .toUpperCase()
  .regex(SHORT_ID_PATTERN, 'A report identifier looks like SF-7K3M-Q9TD');
