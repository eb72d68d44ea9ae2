/**
 * Status bar item: the smallest safety factor of the active note (the worst of every
 * check's `n_f` and `n_y`); a click opens the summary panel.
 */
import * as vscode from 'vscode';
import { statusText } from './statusText';
import type { SummaryState } from './summaryService';

export const SHOW_SUMMARY_COMMAND = 'fatigueNotes.showSummary';

export class SafetyFactorStatus implements vscode.Disposable {
  private readonly item = vscode.window.createStatusBarItem(
    'fatigueNotes.safetyFactor',
    vscode.StatusBarAlignment.Left,
    10,
  );

  constructor() {
    this.item.name = 'fatigue-notes: smallest safety factor';
    this.item.command = SHOW_SUMMARY_COMMAND;
  }

  update(s: SummaryState, enabled: boolean): void {
    const active = vscode.window.activeTextEditor?.document;
    const showing =
      enabled &&
      s.document &&
      active?.languageId === 'markdown' &&
      active.uri.toString() === s.document.uri.toString();
    if (!showing || s.checks.length === 0) {
      this.item.hide();
      return;
    }
    const text = statusText(s);
    this.item.text = text.text;
    this.item.tooltip = new vscode.MarkdownString(text.tooltip);
    this.item.backgroundColor = text.alarm
      ? new vscode.ThemeColor('statusBarItem.errorBackground')
      : undefined;
    this.item.accessibilityInformation = { label: text.label };
    this.item.show();
  }

  dispose(): void {
    this.item.dispose();
  }
}
