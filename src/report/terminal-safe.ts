/**
 * Text from a claim file (names, quoted lines, messages that quote them) may hold
 * control characters — a JSON escape in a claim name, or a binary file's bytes. The
 * terminal report masks them so that the input cannot move the cursor or recolour
 * the terminal; tab and newline are layout and stay.
 */
// C0 controls but tab and newline, DEL, and the C1 controls.
const CONTROL = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f]/g;

export function terminalSafe(text: string): string {
  return text.replace(CONTROL, '\uFFFD');
}
