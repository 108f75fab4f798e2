// A copy of the case whose users draw the reconciled steam: the measured base
// for solving and for savings. Comments and layout of the case are kept.
import { parseDocument } from 'yaml';
import { formatQuantity, type UnitSystem } from '../units/index.js';
import type { ReconcileOutcome } from './reconcilePlant.js';

export interface WrittenCase {
  text: string;
  /** users given their reconciled steam */
  updated: { user: string; steam: string }[];
  /** users whose steam is not observable from the meters (left as the case has them) */
  kept: string[];
}

export function reconciledCase(caseText: string, outcome: ReconcileOutcome, system: UnitSystem, readingsName: string): WrittenCase {
  const document = parseDocument(caseText);
  const users = document.get('users');
  const updated: { user: string; steam: string }[] = [];
  const kept: string[] = [];
  const list = (users as { items?: unknown[] } | undefined)?.items ?? [];
  list.forEach((_, index) => {
    const id = document.getIn(['users', index, 'id']);
    if (typeof id !== 'string') return;
    const stream = outcome.streams.find((entry) => entry.kind === 'process' && entry.to === id);
    if (!stream || !stream.observable || stream.value === null || stream.value < 0) {
      kept.push(id);
      return;
    }
    const steam = formatQuantity(stream.value, 'massFlow', system, { digits: 4 });
    document.setIn(['users', index, 'steam'], steam);
    if (document.hasIn(['users', index, 'heat'])) document.deleteIn(['users', index, 'heat']);
    updated.push({ user: id, steam });
  });
  const note = ` Users' steam reconciled from ${readingsName} by steamwright reconcile (${updated.map((entry) => entry.user).join(', ') || 'none'}).`;
  document.commentBefore = document.commentBefore ? `${note}\n${document.commentBefore}` : note;
  return { text: document.toString(), updated, kept };
}
