import type { TestApp } from './test-app.js';

/** Creates a build through the API and returns its body. */
export async function createBuild(testApp: TestApp, token: string, fields: Record<string, unknown>) {
  const response = await testApp.http().post('/api/builds').set({ Authorization: `Bearer ${token}` }).send(fields).expect(201);
  return response.body as { id: string; version: number } & Record<string, unknown>;
}

/** Creates a circuit of `kind` on a build through the API and returns its body. */
export async function createCircuit(testApp: TestApp, token: string, buildId: string, fields: Record<string, unknown>) {
  const response = await testApp
    .http()
    .post(`/api/builds/${buildId}/circuits`)
    .set({ Authorization: `Bearer ${token}` })
    .send(fields)
    .expect(201);
  return response.body as { id: string; version: number; draftVersion: number } & Record<string, unknown>;
}
