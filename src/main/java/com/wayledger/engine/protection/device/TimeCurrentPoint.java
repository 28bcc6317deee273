package com.wayledger.engine.protection.device;

/**
 * One vertical slice of a time–current band.
 *
 * @param multipleOfRated current as a multiple of In (or of IΔn for a residual band)
 * @param currentAmps the same current in amperes (milliamperes for a residual band)
 * @param minSeconds the device does not trip before this time; null when the lower edge is not
 *     defined here
 * @param maxSeconds the device has tripped by this time; null when it need not trip at this current
 */
public record TimeCurrentPoint(
    double multipleOfRated, double currentAmps, Double minSeconds, Double maxSeconds) {}
