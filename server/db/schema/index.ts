export * from './users';
export * from './auth';
export * from './notebooks';
export * from './audit';
export * from './mail';
export * from './signing';
export * from './collab';
export * from './attachments';
