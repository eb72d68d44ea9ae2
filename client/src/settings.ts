/** The `fatigueNotes.*` settings as the client reads them (the server reads its own through LSP). */
import * as vscode from 'vscode';

export interface ClientSettings {
  units: 'auto' | 'SI' | 'US';
  significantDigits: number;
  lints: Record<string, boolean>;
  statusBar: boolean;
  preview: boolean;
}

export const SECTION = 'fatigueNotes';

export function readSettings(scope?: vscode.ConfigurationScope): ClientSettings {
  const c = vscode.workspace.getConfiguration(SECTION, scope);
  const units = c.get<string>('units', 'auto');
  const digits = c.get<number>('significantDigits', 4);
  return {
    units: units === 'SI' || units === 'US' ? units : 'auto',
    significantDigits: Number.isInteger(digits) && digits >= 2 && digits <= 10 ? digits : 4,
    lints: c.get<Record<string, boolean>>('lints', {}) ?? {},
    statusBar: c.get<boolean>('statusBar.enabled', true),
    preview: c.get<boolean>('preview.enabled', true),
  };
}
