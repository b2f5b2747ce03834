import { TextField, type TextFieldProps } from './field';

/** The obvious slips caught before sending; the server checks the address itself. */
export function looksLikeEmail(text: string): boolean {
  return /^[^\s@]+@[^\s@]+\.[^\s@]+$/.test(text);
}

/** An e-mail box: the phone's e-mail keyboard, no capitals or spelling fixes, the browser's saved address. */
export function EmailField(props: Omit<TextFieldProps, 'type'>) {
  return <TextField type="email" inputMode="email" autoComplete="email" autoCapitalize="none" spellCheck={false} {...props} />;
}
