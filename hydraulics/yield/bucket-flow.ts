import { assertPositive } from '../input-guards';

/** A bucket-and-stopwatch measurement. */
export interface BucketReading {
  /** Volume caught, m³. */
  volumeM3: number;
  /** Time to catch it, s. */
  seconds: number;
}

/** Flow from a timed bucket, m³/s. */
export function bucketFlowM3s({ volumeM3, seconds }: BucketReading, field = 'bucket', index?: number): number {
  assertPositive(volumeM3, `${field}.volumeM3`, index);
  assertPositive(seconds, `${field}.seconds`, index);
  return volumeM3 / seconds;
}

/** A flow given either as a timed bucket or as a direct figure. */
export type FlowMeasurement = { bucket: BucketReading } | { flowM3s: number };

/** The flow a measurement stands for, m³/s. */
export function measuredFlowM3s(measurement: FlowMeasurement, field = 'measurement', index?: number): number {
  if ('bucket' in measurement) return bucketFlowM3s(measurement.bucket, `${field}.bucket`, index);
  assertPositive(measurement.flowM3s, `${field}.flowM3s`, index);
  return measurement.flowM3s;
}
