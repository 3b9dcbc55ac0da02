import { colors } from '@/src/theme';

/**
 * One visible focus ring for every focusable element on web (react-native-web renders
 * Pressable and TextInput as plain elements and removes the browser's outline on inputs).
 */
export function installFocusStyle() {
  if (typeof document === 'undefined' || document.getElementById('sf-focus-style')) return;
  const style = document.createElement('style');
  style.id = 'sf-focus-style';
  style.textContent = `
    [tabindex]:focus-visible, a:focus-visible, button:focus-visible, input:focus-visible,
    textarea:focus-visible, select:focus-visible {
      outline: 3px solid ${colors.focus} !important;
      outline-offset: 2px;
    }`;
  document.head.appendChild(style);
}
