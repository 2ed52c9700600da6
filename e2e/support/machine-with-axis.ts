import { expect, type APIRequestContext } from '@playwright/test';

/**
 * A fresh router with one 16 × 5 screw axis of 926 mm measured travel (640 steps/mm), made
 * through the API, so the demo machines stay as they are for other specs.
 */
export async function newAxis(request: APIRequestContext, name = `Drives test ${Date.now()}`) {
  const machine = await request.post('/api/machines', { data: { name, kind: 'router', workArea: { x: 900, y: 600 } } });
  expect(machine.status()).toBe(201);
  const machineId = (await machine.json()).id as string;
  const axis = await request.post(`/api/machines/${machineId}/axes`, {
    data: {
      name: 'X',
      drive: {
        type: 'screw',
        lead: 5,
        nominalDiameter: 16,
        rootDiameter: 12.9,
        unsupportedLength: 1050,
        mounting: 'fixed-supported',
      },
      motorStepsPerRev: 200,
      microsteps: 16,
      stepsPerMm: 640,
      maxFeedRate: 5000,
      measuredTravelMm: 926,
    },
  });
  expect(axis.status()).toBe(201);
  return { machineId, axisId: (await axis.json()).id as string };
}
