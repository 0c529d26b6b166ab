package org.flexmargin.model;

/**
 * What a feedback sensor measures. Each reads its rigid-body quantity plus the elastic
 * contribution seen at its station (the pick-up that makes structural coupling possible).
 *
 * <p>Example at a station where mode 1 has rotation 0.2 rad and displacement 0.5 m per unit
 * coordinate, with the mode moving as eta = 0.01 sin(2 pi 8 t): a {@code PITCH_RATE_GYRO} reads
 * q + 0.2 d(eta)/dt (peak 0.1 rad/s from the mode); a {@code NORMAL_ACCELEROMETER} reads the rigid
 * n_z plus 0.5 d2(eta)/dt2 / g0 (peak 1.29 g from the mode).
 */
public enum SensorKind {
  /** Pitch rate (rad/s), positive nose up: q plus the modal rotation rate at the station. */
  PITCH_RATE_GYRO,
  /**
   * Normal acceleration (g), positive up: rigid-body acceleration at the station plus the modal
   * displacement acceleration at the station, divided by g0 = 9.80665 m/s^2.
   */
  NORMAL_ACCELEROMETER,
  /** Angle of attack (rad): alpha plus the modal rotation at the station. */
  ANGLE_OF_ATTACK_VANE
}
