/**
 * Web: the async clipboard (needs a secure context or localhost); where it is refused, the
 * link's text is selected so Ctrl/Cmd-C copies it.
 */
export async function copyText(text: string, selectTestId?: string): Promise<boolean> {
  try {
    await navigator.clipboard.writeText(text);
    return true;
  } catch {
    const node = selectTestId ? document.querySelector(`[data-testid="${selectTestId}"]`) : null;
    const selection = window.getSelection();
    if (node && selection) {
      const range = document.createRange();
      range.selectNodeContents(node);
      selection.removeAllRanges();
      selection.addRange(range);
    }
    return false;
  }
}
