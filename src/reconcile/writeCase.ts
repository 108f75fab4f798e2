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
  // A sweep over a user's duty needs the user to keep its duty.
  const swept = new Set<string>();
  const sweepCount = ((document.get('sweeps') as { items?: unknown[] } | undefined)?.items ?? []).length;
  for (let index = 0; index < sweepCount; index++) {
    const target = document.getIn(['sweeps', index, 'target']);
    const match = typeof target === 'string' ? /^users\.([^.]+)\.heat$/.exec(target) : null;
    if (match) swept.add(match[1]);
  }
  list.forEach((_, index) => {
    const id = document.getIn(['users', index, 'id']);
    if (typeof id !== 'string') return;
    if (swept.has(id)) {
      kept.push(id);
      return;
    }
    const stream = outcome.streams.find((entry) => entry.kind === 'process' && entry.to === id);
    if (!stream || !stream.observable || stream.value === null || stream.value < 0) {
      kept.push(id);
      return;
    }
    const steam = formatQuantity(stream.value, 'massFlow', system, { digits: 4 });
    document.setIn(['users', index, 'steam'], steam);
    if (document.hasIn(['users', index, 'heat'])) document.deleteIn(['users', index, 'heat']);
    updated.push({ user: id, steam });
    // A scenario or project that gives this user a duty takes the reconciled steam away there.
    for (const list of ['scenarios', 'projects']) {
      const count = ((document.get(list) as { items?: unknown[] } | undefined)?.items ?? []).length;
      for (let entry = 0; entry < count; entry++) {
        const changes = ((document.getIn([list, entry, 'changes', 'users']) as { items?: unknown[] } | undefined)?.items ?? []).length;
        for (let change = 0; change < changes; change++) {
          const path = [list, entry, 'changes', 'users', change];
          if (document.getIn([...path, 'id']) === id && document.hasIn([...path, 'heat']) && !document.hasIn([...path, 'steam'])) document.setIn([...path, 'steam'], null);
        }
      }
    }
  });
  const note = ` Users' steam reconciled from ${readingsName} by steamwright reconcile (${updated.map((entry) => entry.user).join(', ') || 'none'}).`;
  document.commentBefore = document.commentBefore ? `${note}\n${document.commentBefore}` : note;
  return { text: document.toString(), updated, kept };
}
