import type { FabricationOperationCode, FabricationRemedy } from '../types/finding';

/**
 * How the moves on one member are said together, per operation code: the heading of the combined sentence, the
 * member's words as the checks write them (replaced by "it"/"its" in each move), and how the hours add up.
 * - `largest`: one member reworked in one set-up (jacked, unbolted, cut, welded and refitted once); the moves are
 *   done together, so the labor is the largest move's hours, never their sum. A move's hours are the hours of
 *   reworking the member (the shop's setting for it), so the largest is that one set-up whichever shortfalls combine.
 * - `sum`: separate pieces made under one shop operation (a bracket each side): one line, the pieces' hours added.
 */
const COMBINED_WORDS: Record<FabricationOperationCode, { heading: string; member: string | null; hours: 'largest' | 'sum' }> = {
  'transmission-crossmember': { heading: 'Rework the transmission crossmember', member: 'the transmission crossmember', hours: 'largest' },
  'crossmember-modify': { heading: 'Rework the front crossmember', member: 'the front crossmember', hours: 'largest' },
  'mount-adapters': { heading: 'Make the engine mount brackets', member: null, hours: 'sum' },
};

/** A fabrication operation the plan can choose: one shortfall's remedy, or one member's moves for several shortfalls. */
export interface CombinedFabrication {
  operation: string;
  laborHours: number;
  operationCode?: FabricationOperationCode;
  /** Indices (into the shortfall list given) of the shortfalls it resolves. */
  covers: number[];
}

/** A move as a clause of the combined sentence: "Relocate the transmission crossmember 72.3 mm rearward" → "relocate it 72.3 mm rearward". */
function moveClause(operation: string, member: string | null): string {
  let clause = operation;
  if (member) {
    const pattern = (suffix: string) => new RegExp(`\\b${member.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}${suffix}`, 'i');
    clause = clause.replace(pattern("'s\\b"), 'its').replace(pattern('\\b'), 'it');
  }
  return clause.charAt(0).toLowerCase() + clause.slice(1);
}

/** "a and b"; with three or more (clauses may hold commas): "a; b; and c". */
function joinClauses(clauses: string[]): string {
  if (clauses.length <= 2) return clauses.join(' and ');
  return `${clauses.slice(0, -1).join('; ')}; and ${clauses.at(-1)}`;
}

/**
 * Beside a move that already raises or drops the member, an "either way" height move ("raise or lower it to even out
 * the U-joint angles") is not a second move but a condition on the one height: "set the new height to even out …".
 */
function oneHeightMove(clauses: string[]): string[] {
  const either = /^raise or lower it\b/;
  if (!clauses.some((clause) => /^(raise|drop|lower) (it|its)\b/.test(clause))) return clauses;
  return clauses.map((clause) => clause.replace(either, 'set the new height'));
}

/**
 * Moves that differ in one word only ("Fabricate and weld left engine mount brackets", "… right …") said once with the
 * words joined ("Fabricate and weld left and right engine mount brackets"); null when they differ in more.
 */
function oneSentenceForEach(moves: string[]): string | null {
  const words = moves.map((move) => move.split(' '));
  if (words.some((w) => w.length !== words[0].length)) return null;
  const differing = words[0].map((_, i) => i).filter((i) => words.some((w) => w[i] !== words[0][i]));
  if (differing.length !== 1) return null;
  const [at] = differing;
  const joined = [...new Set(words.map((w) => w[at]))];
  return [...words[0].slice(0, at), joinClauses(joined).replace(/;/g, ','), ...words[0].slice(at + 1)].join(' ');
}

/**
 * The fabrication operations a plan can choose for its shortfalls (each given as its fabrication remedies), in the
 * order they first appear. Common practice (no published source): a shop works a member once, so remedies that
 * name the same operation code for different shortfalls become ONE operation covering all of them, in one sentence
 * naming every move ("Rework the transmission crossmember: relocate it 72.3 mm (2.85 in) rearward and drop it
 * 8.7 mm (0.34 in), or fit a drop crossmember"); a single move keeps its remedy's own words and hours. Within one
 * shortfall a check offers at most one remedy per operation code; should it offer more, the first is that
 * shortfall's move. Remedies without an operation code are keyed by their words, as the same words are the same work.
 */
export function combineFabricationRemedies(shortfalls: readonly (readonly FabricationRemedy[])[]): {
  operations: CombinedFabrication[];
  /** Per shortfall, the operations that resolve it (each once). */
  coveredBy: number[][];
  /** Per shortfall, the operation each of its remedies (in the order given) is part of. */
  operationOf: number[][];
} {
  type Group = { code?: FabricationOperationCode; moves: FabricationRemedy[]; covers: number[] };
  const groups = new Map<string, Group>();
  const keysOf: string[][] = shortfalls.map((remedies, index) =>
    remedies.map((remedy) => {
      const key = remedy.operationCode ? `code:${remedy.operationCode}` : `words:${remedy.operation}`;
      let group = groups.get(key);
      if (!group) {
        group = { ...(remedy.operationCode && { code: remedy.operationCode }), moves: [], covers: [] };
        groups.set(key, group);
      }
      if (!group.covers.includes(index)) {
        group.covers.push(index);
        group.moves.push(remedy);
      }
      return key;
    }),
  );
  const order = [...groups.keys()];
  const operationOf = keysOf.map((keys) => keys.map((key) => order.indexOf(key)));
  const operations = [...groups.values()].map((group): CombinedFabrication => {
    // The same words from two shortfalls are the same move: said once, at the larger of their hours.
    const moves = new Map<string, number>();
    for (const move of group.moves) moves.set(move.operation, Math.max(moves.get(move.operation) ?? 0, move.laborHours));
    const code = group.code && { operationCode: group.code };
    if (moves.size === 1 || !group.code) {
      const [[operation, laborHours]] = moves;
      return { operation, laborHours, ...code, covers: group.covers };
    }
    const words = COMBINED_WORDS[group.code];
    const hours = [...moves.values()];
    const laborHours = words.hours === 'sum' ? Math.round(hours.reduce((sum, h) => sum + h, 0) * 10) / 10 : Math.max(...hours);
    const operation =
      (words.hours === 'sum' && oneSentenceForEach([...moves.keys()])) ||
      `${words.heading}: ${joinClauses(oneHeightMove([...moves.keys()].map((move) => moveClause(move, words.member))))}`;
    return { operation, laborHours, ...code, covers: group.covers };
  });
  return { operations, coveredBy: operationOf.map((indices) => [...new Set(indices)]), operationOf };
}
