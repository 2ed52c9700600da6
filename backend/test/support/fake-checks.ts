import { randomUUID } from 'node:crypto';
import type { MachineRef, ReadinessCheck, ReadinessContributor } from '../../src/records/readiness.js';

/**
 * A test-only readiness contributor: it reports, for the machines a spec registers with it,
 * exactly the checks that spec sets, so every state of the board can be reached on purpose.
 */
export class FakeChecks implements ReadinessContributor {
  readonly recordType = 'test-cut' as const;
  private readonly byMachine = new Map<string, ReadinessCheck[]>();

  async checksFor(machine: MachineRef): Promise<ReadinessCheck[]> {
    return (this.byMachine.get(machine.id) ?? []).map((c) => ({ ...c }));
  }

  /** Two rails' straightness and one positioning run, all within target, each with its own record. */
  seed(machineId: string): ReadinessCheck[] {
    const checks: ReadinessCheck[] = [
      this.check(
        machineId,
        'fake-straightness:Y1',
        'rail-straightness',
        'Rail Y1 (left)',
        12.5,
        'µm',
        { value: 20, unit: 'um' },
        true,
      ),
      this.check(
        machineId,
        'fake-straightness:Y2',
        'rail-straightness',
        'Rail Y2 (right)',
        9.8,
        'µm',
        { value: 20, unit: 'um' },
        true,
      ),
      this.check(
        machineId,
        'fake-positioning:X',
        'positioning',
        'Axis X',
        0.041,
        'mm',
        { value: 0.1, unit: 'mm' },
        false,
      ),
    ];
    this.byMachine.set(machineId, checks);
    return checks;
  }

  /** A new record of the check (a re-measurement) with a new result and status. */
  record(machineId: string, key: string, value: number, status: ReadinessCheck['status']): ReadinessCheck {
    const list = this.byMachine.get(machineId)!;
    const i = list.findIndex((c) => c.key === key);
    list[i] = {
      ...list[i],
      status,
      result: { ...list[i].result!, value, summary: `re-measured: ${value} ${list[i].result!.unit}` },
      recordId: randomUUID(),
      recordedAt: new Date().toISOString(),
    };
    return list[i];
  }

  /** The check without any record yet. */
  clear(machineId: string, key: string): void {
    const list = this.byMachine.get(machineId)!;
    const i = list.findIndex((c) => c.key === key);
    list[i] = {
      ...list[i],
      status: 'not-started',
      result: null,
      recordId: null,
      recordType: null,
      recordedAt: null,
      series: undefined,
    };
  }

  get(machineId: string, key: string): ReadinessCheck {
    return this.byMachine.get(machineId)!.find((c) => c.key === key)!;
  }

  private check(
    machineId: string,
    key: string,
    kind: ReadinessCheck['kind'],
    subject: string,
    value: number,
    unit: string,
    target: NonNullable<ReadinessCheck['target']>,
    withSeries: boolean,
  ): ReadinessCheck {
    return {
      key,
      kind,
      subject,
      status: 'within-target',
      target,
      result: { value, unit, summary: `minimum zone ${value} ${unit}` },
      recordType: this.recordType,
      recordId: randomUUID(),
      recordedAt: '2026-11-30T10:00:00.000Z',
      place: { machineId, tab: 'rails' },
      ...(withSeries
        ? {
            series: {
              title: 'residual from the least-squares line',
              x: { label: 'Station', unit: 'mm' },
              y: { label: 'Residual', unit: 'um' },
              lines: [
                {
                  label: 'residual',
                  points: [
                    [0, 3.1],
                    [200, -2.4],
                    [400, 6.2],
                    [600, -6.3],
                    [800, 1.0],
                  ] as [number, number][],
                },
              ],
              limits: [
                { label: '+t/2', value: 10 },
                { label: '−t/2', value: -10 },
              ],
            },
          }
        : {}),
    };
  }
}
