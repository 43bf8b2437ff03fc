import type TestAgent from 'supertest/lib/agent';
import type { RevisionContent } from '@ionfolio/contracts';

const W = { 'X-Requested-With': 'ionfolio' };

/** Runs a new entry through the real API: the author creates and submits, the curator publishes. */
export async function publishEntry(author: TestAgent, curator: TestAgent, content: RevisionContent): Promise<{ accession: string; id: string }> {
  const created = await author.post('/api/v1/entries').set(W).send(content);
  if (created.status !== 201) throw new Error(`create: ${created.status} ${JSON.stringify(created.body)}`);
  const r = created.body.revision;
  const sent = await author.post(`/api/v1/revisions/${r.id}/submit`).set(W).send({ lockVersion: r.lockVersion });
  if (sent.status !== 200) throw new Error(`submit: ${sent.status} ${JSON.stringify(sent.body)}`);
  const done = await curator.post(`/api/v1/revisions/${r.id}/decision`).set(W).send({ decision: 'publish', lockVersion: sent.body.revision.lockVersion });
  if (done.status !== 200) throw new Error(`publish: ${done.status} ${JSON.stringify(done.body)}`);
  return { accession: r.accession, id: r.id };
}
