/** A FormData from plain fields, as a browser would post a form to a server action. */
export function formData(fields: Record<string, string | number>): FormData {
  const form = new FormData();
  for (const [name, value] of Object.entries(fields)) form.set(name, String(value));
  return form;
}
