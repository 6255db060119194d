import { DEFAULT_WATER_TEMPERATURE_C } from '../constants';
import type { FrictionMethod } from '../friction/head-loss';
import {
  HAZEN_WILLIAMS_DIAMETER_EXPONENT,
  HAZEN_WILLIAMS_FLOW_EXPONENT,
  HAZEN_WILLIAMS_K_SI,
  HAZEN_WILLIAMS_RADIUS_EXPONENT,
} from '../friction/hazen-williams';
import { DEFAULT_LINE_SETTINGS } from '../profile/settings';
import type { NetworkSettings } from './types';

/**
 * ω of h = ω L Q^a / (C^a D^b) implied by V = k C R^0.63 S^0.54 with k = 0.849 and R = D/4:
 * ω = (1 / (k · π/4 · 4^-0.63))^(1/0.54) ≈ 10.6742, the form `hazenWilliamsHeadLoss` computes.
 */
export const DEFAULT_HAZEN_WILLIAMS_CONSTANT =
  (1 / (HAZEN_WILLIAMS_K_SI * (Math.PI / 4) * 0.25 ** HAZEN_WILLIAMS_RADIUS_EXPONENT)) ** HAZEN_WILLIAMS_FLOW_EXPONENT;

/** Settings with every default filled in. */
export type ResolvedNetworkSettings = Required<NetworkSettings>;

/**
 * Defaults match the line analysis (`DEFAULT_LINE_SETTINGS`): Darcy-Weisbach with Colebrook, and
 * the sharp-edged entrance (K = 0.5) plus the velocity head where water leaves a free surface, so a
 * line reads the same flows on its own page and in the network.
 */
export const DEFAULT_NETWORK_SETTINGS: ResolvedNetworkSettings = {
  frictionMethod: 'darcy-weisbach' as FrictionMethod,
  freeSurfaceLosses: true,
  entranceLossK: DEFAULT_LINE_SETTINGS.entranceLossK,
  hazenWilliamsConstant: DEFAULT_HAZEN_WILLIAMS_CONSTANT,
  hazenWilliamsFlowExponent: HAZEN_WILLIAMS_FLOW_EXPONENT,
  hazenWilliamsDiameterExponent: HAZEN_WILLIAMS_DIAMETER_EXPONENT,
  waterTemperatureC: DEFAULT_WATER_TEMPERATURE_C,
  flowTolerance: 1e-9,
  headTolerance: 1e-6,
  maxIterations: 100,
};

export function resolveNetworkSettings(settings: NetworkSettings | undefined): ResolvedNetworkSettings {
  const resolved = { ...DEFAULT_NETWORK_SETTINGS };
  for (const [key, value] of Object.entries(settings ?? {})) {
    if (value !== undefined) (resolved as Record<string, unknown>)[key] = value;
  }
  return resolved;
}
