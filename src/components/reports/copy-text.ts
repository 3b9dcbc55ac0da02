/**
 * Native: there is no clipboard module in this app, so the caller shows the link as selectable
 * text and asks the person to copy it themselves.
 */
export async function copyText(_text: string, _selectTestId?: string): Promise<boolean> {
  return false;
}
