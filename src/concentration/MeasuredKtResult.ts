import type { Measured } from '../uncertainty/Measured.ts';

/** Why a measured Kt cannot be formed (e.g. a load that cannot be told from zero). */
export interface UndefinedKt {
  defined: false;
  reason: string;
}

/** Kt measured at a notch root, or why it cannot be formed. */
export type MeasuredKtResult = { defined: true; kt: Measured } | UndefinedKt;

/** As MeasuredKtResult, with the net-section nominal stress the Kt was referred to. */
export type MeasuredKtWithNominalResult = { defined: true; kt: Measured; nominalStressMPa: Measured } | UndefinedKt;
