export type NameStyle = 'preferred' | 'traditional';
