import { AppText } from '@/src/components/ui';

export type VerifyFilePickerProps = {
  onFile: (file: Blob, name: string) => void;
  disabled?: boolean;
};

/** Native: checking a file is offered on the web page; the identifier works everywhere. */
export function VerifyFilePicker(_props: VerifyFilePickerProps) {
  return (
    <AppText muted testID="verify-file-native">
      To check a PDF file itself, open this page in a web browser and drop the file there.
    </AppText>
  );
}
