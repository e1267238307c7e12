export * from './common';
export * from './auth';
export * from './members';
export * from './notebooks';
export * from './pages';
export * from './chem';
export * from './attachments';
