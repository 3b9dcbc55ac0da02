/**
 * Soundframe's own palette: timber browns and a slate ink on a warm paper ground; severity uses
 * a five-step scale that is always paired with its number (never colour alone). Pure data, so the
 * app (src/theme) and the PDF reports (server/reports) print the same colours.
 */
export const colors = {
  paper: '#F7F3EC',
  surface: '#FFFFFF',
  surfaceSunken: '#EFE8DC',
  ink: '#1F2A30',
  inkMuted: '#56646B',
  line: '#D6CCBC',
  accent: '#1F5E73', // slate teal: primary actions, selection
  accentInk: '#FFFFFF',
  accentSoft: '#D5E7EC',
  timber: '#B9874F',
  timberDark: '#7A5430',
  danger: '#A3312A',
  dangerSoft: '#F6DCD8',
  caution: '#8A5A00',
  cautionSoft: '#FBEBC8',
  ok: '#2F6B3A',
  okSoft: '#DCEEDC',
  focus: '#F0A500',
};

/** Fill for a zone by worst open severity 0–4 (null = nothing logged). */
export const severityFill: Record<number, string> = {
  0: '#CFE3C8',
  1: '#F3E3A1',
  2: '#F1BE7A',
  3: '#DE7F57',
  4: '#A8423A',
};
export const unloggedFill = '#EDE6DA';
export const severityInk: Record<number, string> = {
  0: '#1F2A30',
  1: '#1F2A30',
  2: '#1F2A30',
  3: '#FFFFFF',
  4: '#FFFFFF',
};
