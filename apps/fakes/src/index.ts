export { startFakeOAuth, type FakeOAuth } from './fake-oauth';
export { startFakeSmtp, type FakeSmtp, type CapturedMail } from './fake-smtp';
export { DEMO_IDENTITIES, type DemoIdentity } from './demo-identities';
