import { KIND_LABELS } from './board.js';
import type { ApprovalSnapshot } from './snapshot.js';

const day = (d: Date) => d.toISOString().slice(0, 10);

export function approvalRequestedMail(i: {
  machineName: string;
  workshopName: string;
  requestedBy: string;
  url: string;
  checkCount: number;
  waivedCount: number;
}) {
  return {
    subject: `Approval requested: ${i.machineName}`,
    text: [
      `${i.requestedBy} asks for ${i.machineName} (${i.workshopName}) to be approved as ready to cut.`,
      `All ${i.checkCount} required checks are within target${i.waivedCount ? ` or waived (${i.waivedCount} waived)` : ''}.`,
      '',
      'Review the evidence and sign on the readiness board:',
      i.url,
    ].join('\n'),
  };
}

export function approvedMail(i: {
  snapshot: ApprovalSnapshot;
  approvedBy: string;
  approvedAt: Date;
  recordHash: string;
  recheckDueAt: Date;
  url: string;
}) {
  const waived = i.snapshot.checks.filter((c) => c.status === 'waived');
  return {
    subject: `Ready to cut: ${i.snapshot.machine.name} approved`,
    text: [
      `${i.approvedBy} approved ${i.snapshot.machine.name} (${i.snapshot.workshop.name}) as ready to cut on ${i.approvedAt.toISOString().replace('T', ' ').slice(0, 16)} UTC.`,
      '',
      waived.length
        ? `Checks: ${i.snapshot.checks.length}, of which ${waived.length} waived:`
        : `Checks: ${i.snapshot.checks.length}, all within target.`,
      ...waived.map((c) => `  Waived: ${KIND_LABELS[c.kind]} \u2014 ${c.subject}: ${c.waiver?.reason ?? ''}`),
      `Re-check due: ${day(i.recheckDueAt)}.`,
      `Record hash (SHA-256): ${i.recordHash}`,
      '',
      'The commissioning certificate is attached. The machine file:',
      i.url,
    ].join('\n'),
  };
}

export function recheckDueMail(i: {
  machineName: string;
  workshopName: string;
  approvedAt: Date;
  recheckDueAt: Date;
  url: string;
}) {
  return {
    subject: `Re-check due: ${i.machineName}`,
    text: [
      `${i.machineName} (${i.workshopName}) was approved on ${day(i.approvedAt)} and its re-check was due on ${day(i.recheckDueAt)}.`,
      'Record a new round of checks; the readiness board compares it with the approved round ("what drifted") before it is approved again.',
      '',
      i.url,
    ].join('\n'),
  };
}

export function reopenedMail(i: {
  machineName: string;
  workshopName: string;
  reopenedBy: string;
  reason: string;
  approvedAt: Date;
  url: string;
}) {
  return {
    subject: `Reopened: ${i.machineName} is no longer approved as ready to cut`,
    text: [
      `${i.reopenedBy} reopened ${i.machineName} (${i.workshopName}) for changes. The approval of ${i.approvedAt.toISOString().slice(0, 10)} no longer stands.`,
      '',
      `Reason: ${i.reason}`,
      '',
      'Do not cut with this machine until its changed checks are recorded and it is approved again.',
      `Machine file: ${i.url}`,
    ].join('\n'),
  };
}
