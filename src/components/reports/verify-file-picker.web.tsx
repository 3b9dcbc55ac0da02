import { useRef, useState, type CSSProperties, type DragEvent } from 'react';
import { colors, fonts, radius, spacing } from '@/src/theme';
import type { VerifyFilePickerProps } from './verify-file-picker';

/** Web: a drop zone that is also a button opening a hidden file input limited to PDFs. */
export function VerifyFilePicker({ onFile, disabled }: VerifyFilePickerProps) {
  const input = useRef<HTMLInputElement>(null);
  const [over, setOver] = useState(false);
  const take = (files: FileList | null) => {
    const file = files?.[0];
    if (file && !disabled) onFile(file, file.name);
  };
  const onDrop = (e: DragEvent<HTMLDivElement>) => {
    e.preventDefault();
    setOver(false);
    take(e.dataTransfer.files);
  };
  return (
    <div
      role="button"
      tabIndex={0}
      aria-label="Choose a PDF file to check, or drop it here"
      aria-disabled={disabled}
      data-testid="verify-drop"
      onClick={() => input.current?.click()}
      onKeyDown={(e) => {
        if (e.key === 'Enter' || e.key === ' ') {
          e.preventDefault();
          input.current?.click();
        }
      }}
      onDragOver={(e) => {
        e.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={onDrop}
      style={{ ...zone, ...(over ? zoneOver : null) }}
    >
      <span style={strong}>{over ? 'Drop the PDF to check it' : 'Drop the PDF here'}</span>
      <span>or click to choose the file</span>
      <input
        ref={input}
        type="file"
        accept="application/pdf"
        data-testid="verify-file"
        style={{ display: 'none' }}
        onChange={(e) => {
          take(e.currentTarget.files);
          e.currentTarget.value = '';
        }}
      />
    </div>
  );
}

const zone: CSSProperties = {
  display: 'flex',
  flexDirection: 'column',
  alignItems: 'center',
  gap: spacing.xs,
  padding: spacing.xl,
  borderRadius: radius.lg,
  border: `2px dashed ${colors.accent}`,
  backgroundColor: colors.surface,
  color: colors.ink,
  fontFamily: fonts.regular,
  fontSize: 16,
  cursor: 'pointer',
  textAlign: 'center',
};
const zoneOver: CSSProperties = { backgroundColor: colors.accentSoft, borderStyle: 'solid' };
const strong: CSSProperties = { fontFamily: fonts.bold };
