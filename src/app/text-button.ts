/** A plain button with its label set as text (never markup), for the app's panels, menus and dialogs. */
export function textButton(label: string, id?: string): HTMLButtonElement {
  const button = document.createElement('button');
  button.type = 'button';
  if (id !== undefined) button.id = id;
  button.textContent = label;
  return button;
}
