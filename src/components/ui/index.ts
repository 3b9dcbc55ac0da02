export { AppText, type TextVariant } from './app-text';
export { Badge, SeverityBadge, type BadgeTone } from './badge';
export { Button, type ButtonVariant } from './button';
export { Card } from './card';
export { Checkbox, ChipToggle, SegmentedControl, Select, type Option } from './choice';
export { ConfirmDialog } from './confirm-dialog';
export { installFocusStyle } from './focus-style';
export { Screen } from './screen';
export { Section } from './section';
export { EmptyState, ErrorView, LoadingView } from './states';
export { EmailField, NUMERIC_INPUT, TextField } from './text-field';
export { ToastProvider, useToast, type ToastKind, type ToastOptions } from './toast';
export {
  FIELDS_NEED_ATTENTION,
  saveFailure,
  serverFieldErrors,
  zodFieldErrors,
  type FieldErrors,
} from './form-errors';
export { FieldErrorsNotice, FormMessage } from './form-message';
export { useFormSubmit } from './use-form-submit';
export { FormSection } from './form-section';
