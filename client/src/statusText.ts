/** What the status bar item says about a note's checks (pure). */
import { countByStatus, type SummaryCheck, worstSafetyFactor } from './summary';

/** Text, tooltip and alarm of the status item (pure, for tests). */
export function statusText(s: { checks: readonly SummaryCheck[] }): {
  text: string;
  tooltip: string;
  label: string;
  alarm: boolean;
} {
  const counts = countByStatus(s.checks);
  const worst = worstSafetyFactor(s.checks);
  const alarm = counts.fail > 0 || counts.error > 0;
  const icon = counts.error > 0 ? '$(error)' : counts.fail > 0 ? '$(warning)' : '$(pass)';
  const text = worst
    ? `${icon} lowest safety factor ${worst.display}`
    : `${icon} ${s.checks.length} check${s.checks.length === 1 ? '' : 's'}`;
  const parts = [
    `${s.checks.length} check${s.checks.length === 1 ? '' : 's'}: ${counts.pass} pass, ${counts.fail} fail, ${counts.error} with errors, ${counts.unchecked} without a requirement`,
  ];
  const what = worst ? (worst.name === 'n_y' ? 'first-cycle yield' : 'fatigue') : '';
  const where = worst ? `${what}, \`${worst.name}\` of \`${worst.check ?? '(no id)'}\`` : '';
  const tooltip =
    (worst ? `**Smallest safety factor** in this note: ${worst.display} (${where})\n\n` : '') +
    `${parts[0]}\n\nClick to show the checks of this note.`;
  const label = worst
    ? `Smallest safety factor ${worst.display}, ${what} (${worst.name}) of ${worst.check ?? 'a check without id'}. ${parts[0]}.`
    : parts[0];
  return { text, tooltip, label, alarm };
}
