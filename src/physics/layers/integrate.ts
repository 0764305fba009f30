/**
 * Adaptive Gauss–Kronrod quadrature (7-point Gauss, 15-point Kronrod) for the
 * layer integrals ∫σ(x)dx.
 *
 * Method: the interval is first cut at caller-given breakpoints (junctions,
 * profile peak). Each piece gets the 15-point Kronrod rule K15 and the
 * embedded 7-point Gauss rule G7 from the same evaluations; |K15 − G7| is the
 * error estimate of that piece (conservative for smooth integrands, where K15
 * is far more accurate than G7). The piece with the largest estimate is halved
 * until the summed estimate is below max(absoluteTolerance,
 * relativeTolerance·|total|) or the piece budget is spent; a bounded budget
 * means it always terminates, and an unmet tolerance is reported, not hidden.
 *
 * Nodes and weights: A. S. Kronrod, "Nodes and Weights of Quadrature
 * Formulas" (Consultants Bureau, 1965), as tabulated to 30 digits in QUADPACK
 * (R. Piessens, E. de Doncker-Kapenga, C. W. Überhuber, D. K. Kahaner,
 * QUADPACK, Springer 1983, routine QK15). Checked in the unit tests: K15 is
 * exact for polynomials up to degree 22, G7 up to degree 13, weights sum to 2.
 */
import { PhysicsDomainError } from '../errors';

/* eslint-disable no-loss-of-precision -- coefficients as their source prints them, more digits than a double
   holds; the nearest double is what runs, and cutting digits by hand could round differently */
/** Kronrod abscissae on [−1, 1], positive half, decreasing; odd indices are the Gauss nodes. */
const KRONROD_NODES = [
  0.991455371120812639206854697526329, 0.949107912342758524526189684047851, 0.864864423359769072789712788640926,
  0.741531185599394439863864773280788, 0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
  0.207784955007898467600689403773245, 0,
] as const;

/** Kronrod weights for KRONROD_NODES. */
// Layout kept: Prettier would drop the trailing zeros QUADPACK prints (…058970, …598550), digits of the source.
// prettier-ignore
const KRONROD_WEIGHTS = [
  0.022935322010529224963732008058970, 0.063092092629978553290700663189204, 0.104790010322250183839876322541518,
  0.140653259715525918745189590510238, 0.169004726639267902826583426598550, 0.190350578064785409913256402421014,
  0.204432940075298892414161999234649, 0.209482141084727828012999174891714,
] as const;

/** Gauss weights for the Gauss nodes KRONROD_NODES[1], [3], [5], [7]. */
// Layout kept: Prettier would drop the trailing zero QUADPACK prints (…423780), a digit of the source.
// prettier-ignore
const GAUSS_WEIGHTS = [
  0.129484966168869693270611432679082, 0.279705391489276667901467771423780, 0.381830050505118944950369775488975,
  0.417959183673469387755102040816327,
] as const;
/* eslint-enable no-loss-of-precision */

/** Evaluations per piece. */
export const EVALUATIONS_PER_PIECE = 15;

export interface QuadratureOptions {
  /** Target relative error of the total (default 1e-8). */
  readonly relativeTolerance?: number;
  /** Target absolute error of the total, integrand units × x units (default 0). */
  readonly absoluteTolerance?: number;
  /** Most pieces the interval may be cut into (default 200); bounds the work. */
  readonly maxPieces?: number;
}

export interface QuadratureResult {
  /** The integral (sum of the K15 values of the pieces). */
  readonly value: number;
  /** Sum of the pieces' |K15 − G7|: an upper estimate of the error for smooth integrands. */
  readonly errorEstimate: number;
  /** Pieces used. */
  readonly pieces: number;
  /** Integrand evaluations used. */
  readonly evaluations: number;
}

interface Piece {
  readonly lo: number;
  readonly hi: number;
  readonly value: number;
  readonly error: number;
}

const DEFAULTS = { relativeTolerance: 1e-8, absoluteTolerance: 0, maxPieces: 200 } as const;

function checkedValue(f: (x: number) => number, x: number): number {
  const value = f(x);
  if (!Number.isFinite(value)) {
    throw new PhysicsDomainError(`integrate: the integrand is not finite at x = ${x} (got ${value})`);
  }
  return value;
}

/** K15 and G7 on [lo, hi]. */
function kronrodPiece(f: (x: number) => number, lo: number, hi: number): Piece {
  const centre = 0.5 * (lo + hi);
  const halfWidth = 0.5 * (hi - lo);
  const centreValue = checkedValue(f, centre);
  let kronrod = KRONROD_WEIGHTS[7] * centreValue;
  let gauss = GAUSS_WEIGHTS[3] * centreValue;
  for (let i = 0; i < 7; i++) {
    const offset = halfWidth * KRONROD_NODES[i];
    const pair = checkedValue(f, centre - offset) + checkedValue(f, centre + offset);
    kronrod += KRONROD_WEIGHTS[i] * pair;
    if (i % 2 === 1) gauss += GAUSS_WEIGHTS[(i - 1) / 2] * pair;
  }
  return { lo, hi, value: kronrod * halfWidth, error: Math.abs((kronrod - gauss) * halfWidth) };
}

/**
 * Integrates f over the breakpoints' span, adaptively.
 *
 * @param f - integrand, finite on the open pieces (never evaluated at breakpoints)
 * @param breakpoints - increasing points: the ends, plus interior points where f has a kink or a peak
 * @param options - tolerances and the piece budget
 * @returns the integral, its error estimate and the work done
 * @throws PhysicsDomainError for bad breakpoints or options, a non-finite integrand, or a
 *   tolerance not met within maxPieces (the message gives the estimate reached)
 * @example integrate(Math.sin, [0, Math.PI]).value // ≈ 2.00000000000000 (to about 1e-15)
 */
export function integrate(f: (x: number) => number, breakpoints: readonly number[], options: QuadratureOptions = {}): QuadratureResult {
  const relativeTolerance = options.relativeTolerance ?? DEFAULTS.relativeTolerance;
  const absoluteTolerance = options.absoluteTolerance ?? DEFAULTS.absoluteTolerance;
  const maxPieces = options.maxPieces ?? DEFAULTS.maxPieces;
  if (!(relativeTolerance >= 0) || !(absoluteTolerance >= 0) || relativeTolerance + absoluteTolerance === 0) {
    throw new PhysicsDomainError('integrate: tolerances must be ≥ 0 and not both 0');
  }
  if (breakpoints.length < 2 || !breakpoints.every(Number.isFinite)) {
    throw new PhysicsDomainError(`integrate: needs at least two finite breakpoints; got [${breakpoints.join(', ')}]`);
  }
  for (let i = 1; i < breakpoints.length; i++) {
    if (!(breakpoints[i] > breakpoints[i - 1])) {
      throw new PhysicsDomainError(`integrate: breakpoints must increase strictly; got [${breakpoints.join(', ')}]`);
    }
  }
  if (!Number.isInteger(maxPieces) || maxPieces < breakpoints.length - 1) {
    throw new PhysicsDomainError(`integrate: maxPieces ${maxPieces} must be an integer ≥ the number of initial pieces`);
  }

  const pieces: Piece[] = [];
  for (let i = 1; i < breakpoints.length; i++) pieces.push(kronrodPiece(f, breakpoints[i - 1], breakpoints[i]));
  const totals = () => pieces.reduce((sum, p) => ({ value: sum.value + p.value, error: sum.error + p.error }), { value: 0, error: 0 });

  let { value, error } = totals();
  while (error > Math.max(absoluteTolerance, relativeTolerance * Math.abs(value))) {
    if (pieces.length + 1 > maxPieces) {
      throw new PhysicsDomainError(`integrate: tolerance not met within ${maxPieces} pieces (integral ${value}, estimated error ${error})`);
    }
    let worst = 0;
    for (let i = 1; i < pieces.length; i++) if (pieces[i].error > pieces[worst].error) worst = i;
    const { lo, hi } = pieces[worst];
    const middle = 0.5 * (lo + hi);
    pieces.splice(worst, 1, kronrodPiece(f, lo, middle), kronrodPiece(f, middle, hi));
    // Re-summing keeps round-off from accumulating in running totals.
    ({ value, error } = totals());
  }
  return { value, errorEstimate: error, pieces: pieces.length, evaluations: countEvaluations(pieces.length, breakpoints.length - 1) };
}

/** Evaluations: every piece ever evaluated, i.e. initial pieces plus two per split. */
function countEvaluations(finalPieces: number, initialPieces: number): number {
  const splits = finalPieces - initialPieces;
  return EVALUATIONS_PER_PIECE * (initialPieces + 2 * splits);
}
