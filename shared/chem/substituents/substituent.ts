import { longestSubstituentChains } from '../chain/paths';
import { NamingRefusal } from '../assembly/refusal';
import { parentPart, renderUnit } from '../assembly/unit';
import { isCarbonyl } from '../groups/scope';
import { isAldehydeCarbon } from '../groups/principal';
import { alkoxy } from './alkoxy';
import { amino } from './amino';
import { acylPrefix } from './acyl';
import type { Attachment, NamingContext, Skeleton, SubstituentName } from '../numbering/context';
import { evaluate } from '../numbering/evaluate';
import { bestCandidates, firstByName } from '../numbering/select';
import { ringNumberings } from '../rings/numberings';
import { bondBetween } from '../graph/rings';
import { retainedPrefix } from './retained';

/**
 * Names the substituent group that starts at `atom` and hangs from the parent atom `from`:
 * halogen or nitro prefixes, or a carbon group named on its own parent (a chain or ring that
 * contains the attachment atom) with its own numbering and prefixes, recursively (P-29, P-44
 * applied to the group).
 */
export function nameSubstituent(ctx: NamingContext, atom: number, from: number): SubstituentName {
  const key = atom * ctx.graph.atoms.length + from;
  const known = ctx.substituents.get(key);
  if (known) return known;
  const result = build(ctx, atom, from);
  ctx.substituents.set(key, result);
  return result;
}

function build(ctx: NamingContext, atom: number, from: number): SubstituentName {
  const { graph } = ctx;
  const group = ctx.groups.get(atom);
  if (group?.kind === 'ether') return alkoxy(ctx, atom, from, collectAtoms(ctx, atom, from));
  if (group?.kind === 'amino') return amino(ctx, atom, from, collectAtoms(ctx, atom, from));
  if (group?.kind === 'ester' || group?.kind === 'acylHalide') {
    throw new NamingRefusal(`the ${group.kind === 'ester' ? 'ester' : 'acid halide'} group at atom ${atom + 1} would be a prefix (alkoxycarbonyl, acyloxy, halocarbonyl), which is not named yet`);
  }
  if (group?.kind === 'carbamoyl' && graph.atoms[group.atoms[2]].hydrogens !== 2) {
    throw new NamingRefusal(`the N-substituted amide group at atom ${atom + 1} would be a prefix, which is not named yet`);
  }
  // On a ring the CONH2 carbon cannot join the parent: carbamoyl. On a chain, whether it is
  // carbamoyl or 'amino…oxo' with the carbon in the chain (P-66.1.4) is not settled here.
  if (group?.kind === 'carbamoyl' && ctx.rings.systemOf[from] < 0) {
    throw new NamingRefusal(`the amide group at atom ${atom + 1} on a chain would be a prefix (carbamoyl or amino…oxo, P-66.1.4), which is not named yet`);
  }
  if (group) return { name: group.kind, compound: false, enclose: false, atoms: collectAtoms(ctx, atom, from) };
  if (graph.atoms[atom].element !== 'C') {
    const owner = [...ctx.groups.values()].find((g) => g.atoms.includes(atom));
    if (owner) throw new NamingRefusal(`atom ${atom + 1} (${graph.atoms[atom].element}) belongs to the ${owner.kind} group on atom ${owner.atom + 1}; seen from this side it would be an acyloxy or acylamino prefix, which is not named yet`);
    throw new NamingRefusal(`atom ${atom + 1} (${graph.atoms[atom].element}) cannot be named as a substituent yet`);
  }
  if (isAldehydeCarbon(graph, atom)) {
    // P-66.6.1.2: -CHO as a prefix is formyl (its carbon cannot join a chain here: it has no other carbon).
    if (graph.adjacency[atom].every((e) => e.atom === from || graph.atoms[e.atom].element === 'O')) return { name: 'formyl', compound: false, enclose: false, atoms: collectAtoms(ctx, atom, from) };
  } else if (isCarbonyl(graph, atom)) {
    return acylPrefix(ctx, atom, from, collectAtoms(ctx, atom, from));
  }
  const order = graph.bonds[bondBetween(graph, atom, from)].order;
  const attachment: Attachment = { atom, from, order };
  const system = ctx.rings.systemOf[atom];
  const skeletons: Skeleton[] =
    system >= 0
      ? ringNumberings(graph, ctx.rings.systems[system].atoms, atom)
      : longestSubstituentChains(ctx, atom, from, ctx.style === 'traditional').map((atoms) => ({ kind: 'chain' as const, atoms }));
  const best = bestCandidates(skeletons.map((s) => evaluate(ctx, s, attachment)));
  const { item, name } = firstByName(best, (e) => renderUnit(ctx, e));
  const retained = retainedPrefix(name, ctx.style);
  const atoms = collectAtoms(ctx, atom, from);
  if (retained) return { name: retained, compound: false, enclose: false, atoms };
  return { name, compound: item.prefixes.length > 0, enclose: item.prefixes.length > 0 || /\d/.test(name), atoms, hydride: parentPart(item, ctx) };
}

function collectAtoms(ctx: NamingContext, atom: number, from: number): number[] {
  const seen = new Set<number>([from, atom]);
  const queue = [atom];
  for (let i = 0; i < queue.length; i++) {
    for (const { atom: next } of ctx.graph.adjacency[queue[i]]) if (!seen.has(next)) (seen.add(next), queue.push(next));
  }
  return queue.sort((a, b) => a - b);
}
