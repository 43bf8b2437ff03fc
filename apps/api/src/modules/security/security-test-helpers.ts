import type TestAgent from 'supertest/lib/agent';
import { W } from '../identify/identify-test-helpers';

export { W };

/** Creates an access key with `scopes` for the signed-in `agent`; returns its secret. */
export async function createKey(agent: TestAgent, scopes: string[]): Promise<string> {
  const res = await agent.post('/api/v1/access-keys').set(W).send({ name: `security test ${scopes.join(' ')}`, scopes });
  if (res.status !== 201) throw new Error(`access key: ${res.status} ${JSON.stringify(res.body)}`);
  return res.body.secret as string;
}
