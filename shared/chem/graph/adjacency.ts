import type { Bond } from './types';

export function buildAdjacency(atomCount: number, bonds: Bond[]): { atom: number; bond: number }[][] {
  const adjacency: { atom: number; bond: number }[][] = Array.from({ length: atomCount }, () => []);
  for (const bond of bonds) {
    adjacency[bond.from].push({ atom: bond.to, bond: bond.index });
    adjacency[bond.to].push({ atom: bond.from, bond: bond.index });
  }
  return adjacency;
}
