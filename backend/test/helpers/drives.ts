import type { TestWorkshop } from './test-app.js';

/** A 16 × 5 rolled ball screw axis (root ≈ 12.9 mm, inferred from a rolled 16 × 5 catalogue row). */
export const screwAxis = (name = 'X') => ({
  name,
  drive: {
    type: 'screw',
    lead: 5,
    nominalDiameter: 16,
    rootDiameter: 12.9,
    unsupportedLength: 1000,
    mounting: 'fixed-supported',
  },
  motorStepsPerRev: 200,
  microsteps: 16,
  stepsPerMm: 640,
  maxFeedRate: 5000,
  measuredTravelMm: 920,
});

export const rackAxis = (name = 'Y1') => ({
  name,
  drive: { type: 'rack', pinionModule: 1.5, pinionTeeth: 20 },
  motorStepsPerRev: 200,
  microsteps: 8,
  gearRatio: 3,
  stepsPerMm: 50.93,
  maxFeedRate: 20000,
  measuredTravelMm: 1540,
});

export async function newMachine(
  ws: TestWorkshop,
  kind: 'plasma' | 'router' = 'router',
  workArea = { x: 900, y: 600 },
): Promise<string> {
  const res = await ws.as.owner
    .post('/api/machines')
    .send({ name: `Drives ${kind} ${Math.random().toString(36).slice(2, 7)}`, kind, workArea });
  if (res.status !== 201) throw new Error(`machine: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id;
}

export async function newAxis(ws: TestWorkshop, machineId: string, body: object = screwAxis()): Promise<string> {
  const res = await ws.as.technician.post(`/api/machines/${machineId}/axes`).send(body);
  if (res.status !== 201) throw new Error(`axis: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.id;
}
