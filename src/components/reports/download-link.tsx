import { Linking } from 'react-native';
import { API_BASE } from '@/src/api/client';
import { Button } from '@/src/components/ui';

export type DownloadLinkProps = {
  url: string;
  fileName: string;
  label?: string;
  /** Spoken name when the label needs context ("Download version 2"). */
  accessibilityLabel?: string;
  compact?: boolean;
  testID?: string;
};

/** Native: hand the PDF's address to the system, which downloads or opens it. */
export function DownloadLink({
  url,
  label = 'Download PDF',
  accessibilityLabel,
  compact,
  testID,
}: DownloadLinkProps) {
  return (
    <Button
      label={label}
      variant="secondary"
      compact={compact}
      accessibilityLabel={accessibilityLabel}
      onPress={() => Linking.openURL(url.startsWith('/') ? `${API_BASE}${url}` : url)}
      testID={testID}
    />
  );
}
