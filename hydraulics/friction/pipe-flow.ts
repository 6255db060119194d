/** Cross-section area of a full circular pipe, m². */
export function pipeAreaM2(diameterM: number): number {
  return 0.25 * Math.PI * diameterM * diameterM;
}

/** Mean velocity, m/s (signed like the flow), of `flowM3s` in a full pipe of `diameterM`. */
export function meanVelocityMs(flowM3s: number, diameterM: number): number {
  return flowM3s / pipeAreaM2(diameterM);
}
