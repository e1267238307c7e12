import type { Role } from '../../shared/schemas/common';

/** The invented Saltmarsh Lane flavour-ester group; every name here is made up. */
export const DEMO_PASSWORD = 'quillane-demo';

export const demoPeople: { email: string; name: string; role: Role }[] = [
  { email: 'admin@saltmarsh.test', name: 'Ottilie Brack', role: 'admin' },
  { email: 'supervisor@saltmarsh.test', name: 'Dr Haldor Venn', role: 'supervisor' },
  { email: 'chemist@saltmarsh.test', name: 'Imke Sallow', role: 'chemist' },
  { email: 'chemist2@saltmarsh.test', name: 'Rafe Mossgiel', role: 'chemist' },
  { email: 'viewer@saltmarsh.test', name: 'Perpetua Lisle', role: 'viewer' },
];
