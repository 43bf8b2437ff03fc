/**
 * Invented people of an invented company (Quillmere Aroma Chemicals, QC laboratory). The stand-in
 * provider offers them on its sign-in page; the API's demo seed gives them their roles.
 */
export interface DemoIdentity {
  id: number;
  login: string;
  name: string;
  email: string;
  demoRole: 'reader' | 'contributor' | 'curator' | 'admin';
}

export const DEMO_IDENTITIES: readonly DemoIdentity[] = [
  { id: 710001, login: 'ines.varga', name: 'Ines Varga', email: 'ines.varga@quillmere.example', demoRole: 'admin' },
  { id: 710002, login: 'dana.okafor', name: 'Dana Okafor', email: 'dana.okafor@quillmere.example', demoRole: 'curator' },
  { id: 710003, login: 'tomas.reyes', name: 'Tomas Reyes', email: 'tomas.reyes@quillmere.example', demoRole: 'contributor' },
  { id: 710004, login: 'mira.lindqvist', name: 'Mira Lindqvist', email: 'mira.lindqvist@quillmere.example', demoRole: 'reader' },
];
