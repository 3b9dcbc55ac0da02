import { literal, Op, type Transaction } from 'sequelize';
import { ERROR_CODES } from '@/shared/schemas/common';
import {
  REPORT_KIND_LABELS,
  type createShareRequest,
  type CreateShareResponse,
  type PublicShareResponse,
  type ShareResponse,
} from '@/shared/schemas/report';
import type { z } from 'zod';
import { AppError, notFound } from '../errors';
import { escapeHtml, mailFailed } from '../mail/compose';
import type { Mailer } from '../mail/transport';
import type { MemberContext } from '../middleware/workshop';
import { Report, ReportShare, User, Vehicle, Workshop } from '../models';
import type { StorageAdapter } from '../storage';
import { audit } from './audit';
import { findReportFor, latestReadyVersion, readReportPdf } from './reports';
import { hashLinkToken, LINK_TOKEN_FORMAT, newLinkToken } from './tokens';
import { isUuid } from './vehicle-access';

type CreateShare = z.output<typeof createShareRequest>;

const DAY_MS = 24 * 3600_000;

/** The one answer for every link that does not work, whatever the reason, so nothing is told apart. */
export const linkNotAvailable = () =>
  new AppError(
    404,
    ERROR_CODES.notFound,
    'This link is not available. It may have expired or been withdrawn.',
  );

export function shareStatus(s: Pick<ReportShare, 'revokedAt' | 'expiresAt'>, now = new Date()) {
  if (s.revokedAt) return 'revoked' as const;
  return s.expiresAt.getTime() <= now.getTime() ? ('expired' as const) : ('active' as const);
}

export function toShareResponse(s: ReportShare): ShareResponse {
  return {
    id: s.id,
    reportId: s.reportId,
    recipientEmail: s.recipientEmail,
    expiresAt: s.expiresAt.toISOString(),
    revokedAt: s.revokedAt ? s.revokedAt.toISOString() : null,
    status: shareStatus(s),
    viewCount: s.viewCount,
    lastViewedAt: s.lastViewedAt ? s.lastViewedAt.toISOString() : null,
    downloadCount: s.downloadCount,
    lastDownloadedAt: s.lastDownloadedAt ? s.lastDownloadedAt.toISOString() : null,
    emailedAt: s.emailedAt ? s.emailedAt.toISOString() : null,
    createdByName: s.createdBy?.name ?? null,
    createdAt: s.createdAt.toISOString(),
  };
}

const CREATED_BY = { model: User, as: 'createdBy', attributes: ['id', 'name'] };

export async function listShares(member: MemberContext, reportId: string) {
  const report = await findReportFor(member, reportId);
  const rows = await ReportShare.findAll({
    where: { reportId: report.id },
    include: [CREATED_BY],
    order: [['createdAt', 'DESC']],
  });
  return rows.map(toShareResponse);
}

/**
 * Makes a link to a ready report, and e-mails it when a recipient is given. The mail is sent
 * inside the transaction: if it cannot be sent, no link is left that nobody received.
 */
export async function createShare(
  member: MemberContext,
  reportId: string,
  body: CreateShare,
  /** `appUrl` without a trailing slash, as appUrlOf gives it. */
  opts: { mailer: Mailer; appUrl: string },
): Promise<CreateShareResponse> {
  return ReportShare.sequelize!.transaction(async (transaction: Transaction) => {
    const report = await findReportFor(member, reportId, { transaction });
    if (report.status !== 'ready')
      throw new AppError(
        409,
        ERROR_CODES.conflict,
        'Only a report that is ready can be shared. Wait until it is generated.',
      );
    const token = newLinkToken();
    const share = await ReportShare.create(
      {
        workshopId: member.workshopId,
        reportId: report.id,
        tokenHash: hashLinkToken(token),
        recipientEmail: body.recipientEmail,
        message: body.message,
        expiresAt: new Date(Date.now() + body.expiresInDays * DAY_MS),
        createdById: member.userId,
      },
      { transaction },
    );
    const what = `${REPORT_KIND_LABELS[report.kind]} ${report.shortId} (version ${report.version})`;
    const expiry = share.expiresAt.toISOString().slice(0, 10);
    await audit(transaction, {
      workshopId: member.workshopId,
      actorId: member.userId,
      action: 'report-share.create',
      entityType: 'report-share',
      entityId: share.id,
      summary: `Shared ${what} ${body.recipientEmail ? `by e-mail with ${body.recipientEmail}` : 'as a link'} until ${expiry}`,
      changes: {
        reportId: report.id,
        recipientEmail: body.recipientEmail,
        expiresAt: share.expiresAt.toISOString(),
      },
    });

    const url = `${opts.appUrl}/shared/${token}`;
    if (body.recipientEmail) {
      const [workshop, sender] = await Promise.all([
        Workshop.findByPk(member.workshopId, { attributes: ['name'], transaction }),
        User.findByPk(member.userId, { attributes: ['name'], transaction }),
      ]);
      try {
        await opts.mailer.send(
          shareMail({
            to: body.recipientEmail,
            url,
            what: `${REPORT_KIND_LABELS[report.kind]} for ${report.summary?.vehicleTitle ?? 'a vehicle'}`,
            shortId: report.shortId,
            workshop: workshop?.name ?? 'A workshop',
            sender: sender?.name ?? 'Someone',
            expiry,
            message: body.message,
          }),
        );
      } catch {
        throw mailFailed('The e-mail could not be sent. No link was made; try again in a moment.');
      }
      share.emailedAt = new Date();
      await share.save({ transaction });
    }
    share.createdBy = (await User.findByPk(member.userId, { transaction })) ?? undefined;
    return { ...toShareResponse(share), token, url };
  });
}

function shareMail(p: {
  to: string;
  url: string;
  what: string;
  shortId: string;
  workshop: string;
  sender: string;
  expiry: string;
  message: string;
}) {
  const intro = `${p.sender} of ${p.workshop} has shared a report with you on Soundframe: the ${p.what} (${p.shortId}).`;
  const expiry = `The link works until ${p.expiry}; no account is needed. You can check that the PDF is unchanged on the verification page.`;
  const text = [
    intro,
    ...(p.message ? ['', `Their message: ${p.message}`] : []),
    '',
    'Open the report here:',
    p.url,
    '',
    expiry,
  ].join('\n');
  const html =
    `<p>${escapeHtml(intro)}</p>` +
    (p.message ? `<blockquote>${escapeHtml(p.message).replace(/\n/g, '<br>')}</blockquote>` : '') +
    `<p><a href="${escapeHtml(p.url)}">Open the report</a></p>` +
    `<p>${escapeHtml(expiry)}</p>`;
  return { to: p.to, subject: `${p.workshop} shared a report with you`, text, html };
}

/** Stops a link working at once. Revoking twice answers the first revocation. */
export async function revokeShare(member: MemberContext, shareId: string) {
  return ReportShare.sequelize!.transaction(async (transaction) => {
    const share = isUuid(shareId)
      ? await ReportShare.findOne({
          where: { id: shareId, workshopId: member.workshopId },
          lock: transaction.LOCK.UPDATE,
          transaction,
        })
      : null;
    if (!share) throw notFound('Share');
    const report = await findReportFor(member, share.reportId, { transaction });
    if (!share.revokedAt) {
      share.revokedAt = new Date();
      share.revokedById = member.userId;
      await share.save({ transaction });
      await audit(transaction, {
        workshopId: member.workshopId,
        actorId: member.userId,
        action: 'report-share.revoke',
        entityType: 'report-share',
        entityId: share.id,
        summary: `Withdrew a link to ${REPORT_KIND_LABELS[report.kind]} ${report.shortId} (version ${report.version})`,
        changes: { reportId: report.id, recipientEmail: share.recipientEmail },
      });
    }
    share.createdBy =
      (share.createdById ? await User.findByPk(share.createdById, { transaction }) : null) ??
      undefined;
    return toShareResponse(share);
  });
}

/** A working link's share and ready report, or the one 404; looked up by the token's hash only. */
async function usableShare(token: string) {
  if (!LINK_TOKEN_FORMAT.test(token)) throw linkNotAvailable();
  const share = await ReportShare.findOne({
    where: {
      tokenHash: hashLinkToken(token),
      revokedAt: null,
      expiresAt: { [Op.gt]: new Date() },
    },
    include: [
      {
        model: Report,
        as: 'report',
        required: true,
        where: { status: 'ready' },
        attributes: { exclude: ['snapshot'] },
        // A soft-deleted vehicle takes its reports' links with it.
        include: [{ model: Vehicle, as: 'vehicle', required: true, attributes: ['id'] }],
      },
    ],
  });
  if (!share?.report?.summary) throw linkNotAvailable();
  return { share, report: share.report };
}

/** The share page: counts the view (one atomic UPDATE) and answers the report's public summary. */
export async function openShare(token: string): Promise<PublicShareResponse> {
  const { share, report } = await usableShare(token);
  await ReportShare.update(
    { viewCount: literal('view_count + 1'), lastViewedAt: new Date() },
    { where: { id: share.id } },
  );
  const latest = await latestReadyVersion(report.vehicleId, report.kind);
  return {
    report: {
      kind: report.kind,
      version: report.version,
      shortId: report.shortId,
      generatedAt: report.createdAt.toISOString(),
      sha256: report.sha256 ?? '',
      pageCount: report.pageCount ?? 0,
      byteSize: report.byteSize ?? 0,
      newerVersionExists: latest > report.version,
    },
    summary: report.summary!,
    expiresAt: share.expiresAt.toISOString(),
    pdfUrl: `/api/public/shares/${token}/pdf`,
  };
}

/** The PDF behind a link; a download that could be served is counted (one atomic UPDATE). */
export async function sharedPdf(token: string, storage: StorageAdapter) {
  const { share, report } = await usableShare(token);
  const pdf = await readReportPdf(report, storage).catch(() => {
    throw linkNotAvailable();
  });
  await ReportShare.update(
    { downloadCount: literal('download_count + 1'), lastDownloadedAt: new Date() },
    { where: { id: share.id } },
  );
  return pdf;
}
