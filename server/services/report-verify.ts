import crypto from 'node:crypto';
import { REPORT_KIND_LABELS, type VerifyResponse } from '@/shared/schemas/report';
import { Report, Workshop } from '../models';
import { latestReadyVersion } from './reports';

/** Short identifiers as the renderer writes them into the file (info dictionary and footer). */
const CLAIMED_ID = /SF-[0-9A-HJKMNP-TV-Z]{4}-[0-9A-HJKMNP-TV-Z]{4}/;

const FIELDS = [
  'id',
  'workshopId',
  'vehicleId',
  'kind',
  'version',
  'shortId',
  'sha256',
  'createdAt',
];

async function describe(report: Report): Promise<NonNullable<VerifyResponse['report']>> {
  const [latestVersion, workshop] = await Promise.all([
    latestReadyVersion(report.vehicleId, report.kind),
    Workshop.findByPk(report.workshopId, { attributes: ['name'] }),
  ]);
  return {
    shortId: report.shortId,
    kind: report.kind,
    version: report.version,
    latestVersion,
    newerVersionExists: latestVersion > report.version,
    generatedAt: report.createdAt.toISOString(),
    sha256: report.sha256 ?? '',
    workshopName: workshop?.name ?? '',
  };
}

const issued = (shortId: string) =>
  Report.findOne({ where: { shortId, status: 'ready' }, attributes: FIELDS });

function versionWords(r: NonNullable<VerifyResponse['report']>) {
  const base = `version ${r.version} of the ${REPORT_KIND_LABELS[r.kind].toLowerCase()} issued by ${r.workshopName} on ${r.generatedAt.slice(0, 10)}`;
  return r.newerVersionExists
    ? `${base}. A newer version (${r.latestVersion}) has been issued since; ask the workshop for it.`
    : `${base}. It is the newest version.`;
}

/** An identifier alone proves only that such a report was issued, not that a copy is unchanged. */
export async function verifyShortId(shortId: string): Promise<VerifyResponse> {
  const report = await issued(shortId);
  if (!report)
    return {
      genuine: false,
      matchedBy: null,
      claimedShortId: null,
      report: null,
      message: `No report with the identifier ${shortId} was issued through Soundframe. Check it for typing mistakes.`,
    };
  const described = await describe(report);
  return {
    genuine: true,
    matchedBy: 'id',
    claimedShortId: null,
    report: described,
    message: `${shortId} is ${versionWords(described)} To check that your copy is unchanged, drop the PDF file here.`,
  };
}

/** The file's SHA-256 against every issued report; a near miss says which report the file claims to be. */
export async function verifyPdf(pdf: Buffer): Promise<VerifyResponse> {
  const sha256 = crypto.createHash('sha256').update(pdf).digest('hex');
  const match = await Report.findOne({ where: { sha256, status: 'ready' }, attributes: FIELDS });
  if (match) {
    const described = await describe(match);
    return {
      genuine: true,
      matchedBy: 'hash',
      claimedShortId: null,
      report: described,
      message: `This file is exactly ${match.shortId}, ${versionWords(described)}`,
    };
  }
  const claimed = CLAIMED_ID.exec(pdf.toString('latin1'))?.[0];
  const claimedReport = claimed ? await issued(claimed) : null;
  return {
    genuine: false,
    matchedBy: null,
    claimedShortId: claimedReport ? claimedReport.shortId : null,
    report: null,
    message: claimedReport
      ? `This file claims to be report ${claimed}, but it differs from the file that was issued: it has been changed since it was generated. Ask the workshop for the original.`
      : claimed
        ? `This file names ${claimed}, but no report with that identifier was issued through Soundframe.`
        : 'This file does not match any report issued through Soundframe.',
  };
}
