import type { CSSProperties } from 'react';
import { colors, fonts, radius, spacing } from '@/src/theme';
import type { DownloadLinkProps } from './download-link';

/** Web: a plain link with `download`, so the browser saves the file with the session cookie. */
export function DownloadLink({
  url,
  fileName,
  label = 'Download PDF',
  accessibilityLabel,
  compact,
  testID,
}: DownloadLinkProps) {
  return (
    <a
      href={url}
      download={fileName}
      aria-label={accessibilityLabel ?? label}
      data-testid={testID}
      style={{ ...style, minHeight: compact ? 44 : 48 }}
    >
      {label}
    </a>
  );
}

const style: CSSProperties = {
  display: 'inline-flex',
  alignItems: 'center',
  justifyContent: 'center',
  boxSizing: 'border-box',
  paddingLeft: spacing.lg,
  paddingRight: spacing.lg,
  borderRadius: radius.md,
  border: `2px solid ${colors.accent}`,
  backgroundColor: colors.surface,
  color: colors.accent,
  fontFamily: fonts.bold,
  fontSize: 16,
  textDecoration: 'none',
  alignSelf: 'flex-start',
};
