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
  // A factor below 1 is never shown beside a tick, whatever the requirements say.
  const below = worst !== null && worst.value < 1;
  const icon = counts.error > 0 ? '$(error)' : counts.fail > 0 || below ? '$(warning)' : '$(pass)';
  // The icon speaks of the checks' status; say which, so that it is not read as the factor's.
  const status =
    counts.error > 0 ? `${counts.error} with errors · ` : counts.fail > 0 ? `${counts.fail} failed · ` : '';
  const text = worst
    ? `${icon} ${status}lowest safety factor ${worst.display}${below ? ' (below 1)' : ''}`
    : `${icon} ${status}${s.checks.length} check${s.checks.length === 1 ? '' : 's'}`;
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
