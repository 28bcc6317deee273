package com.wayledger.engine.protection.device;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.TripCurve;
import java.util.List;
import org.junit.jupiter.api.Test;

class TimeCurrentBandTests {

  private static TimeCurrentPoint at(List<TimeCurrentPoint> points, double multiple) {
    return points.stream()
        .filter(p -> Math.abs(p.multipleOfRated() - multiple) < 1e-9)
        .findFirst()
        .orElseThrow();
  }

  // IEC 60898-1 Table 7 a: no trip within 1 h at 1.13·In (In ≤ 63 A); b: trip within 1 h at 1.45·In
  @Test
  void conventionalPointsBoundTheThermalRegion() {
    TimeCurrentBand band =
        TimeCurrentBand.of(DeviceCharacteristic.miniature(DeviceKind.MCB, TripCurve.B, 16, null));
    assertThat(at(band.points(), 1.13).minSeconds()).isEqualTo(3600.0);
    assertThat(at(band.points(), 1.13).maxSeconds()).isNull();
    assertThat(at(band.points(), 1.45).maxSeconds()).isEqualTo(3600.0);
  }

  // IEC 60898-1 Table 7 c: at 2.55·In, 1 s < t < 60 s for In ≤ 32 A and 1 s < t < 120 s above
  @Test
  void thermalTestPointUses60SecondsUpTo32AmpsAnd120Above() {
    TimeCurrentBand small =
        TimeCurrentBand.of(DeviceCharacteristic.miniature(DeviceKind.MCB, TripCurve.C, 32, null));
    TimeCurrentBand large =
        TimeCurrentBand.of(DeviceCharacteristic.miniature(DeviceKind.MCB, TripCurve.C, 40, null));
    assertThat(at(small.points(), 2.55).minSeconds()).isEqualTo(1.0);
    assertThat(at(small.points(), 2.55).maxSeconds()).isEqualTo(60.0);
    assertThat(at(large.points(), 2.55).maxSeconds()).isEqualTo(120.0);
  }

  // IEC 60898-1 Table 7 e: at the upper band edge (5·In for B) the breaker trips within 0.1 s
  @Test
  void upperBandEdgeTripsWithinATenthOfASecond() {
    TimeCurrentBand band =
        TimeCurrentBand.of(DeviceCharacteristic.miniature(DeviceKind.MCB, TripCurve.B, 16, null));
    assertThat(
            band.points().stream()
                .filter(p -> p.multipleOfRated() == 5.0)
                .mapToDouble(TimeCurrentPoint::maxSeconds)
                .min()
                .orElseThrow())
        .isEqualTo(0.1);
  }

  // IEC 60898-1 Table 7 d: at the lower band edge (10·In for D) no trip within 0.1 s; (common
  // practice) so a start-up
  // surge of some 10 ms, below the band, does not trip it either
  @Test
  void lowerBandEdgeHoldsForATenthOfASecond() {
    TimeCurrentBand band =
        TimeCurrentBand.of(DeviceCharacteristic.miniature(DeviceKind.MCB, TripCurve.D, 16, null));
    assertThat(band.points().get(3).multipleOfRated()).isEqualTo(10.0);
    assertThat(band.points().get(3).minSeconds()).isGreaterThanOrEqualTo(0.1);
  }

  @Test
  void everyPointHasItsLowerEdgeBelowItsUpperEdge() {
    for (TripCurve curve : TripCurve.values()) {
      for (double in : McbStandard.STANDARD_RATINGS_AMPS) {
        for (TimeCurrentPoint p :
            TimeCurrentBand.of(DeviceCharacteristic.miniature(DeviceKind.MCB, curve, in, null))
                .points()) {
          if (p.minSeconds() != null && p.maxSeconds() != null) {
            assertThat(p.minSeconds())
                .as("%s%s at %s·In", curve, in, p.multipleOfRated())
                .isLessThanOrEqualTo(p.maxSeconds());
          }
        }
      }
    }
  }

  // IEC 61008-1 Table 1 (general type): 300 ms at IΔn, 150 ms at 2·IΔn, 40 ms at 5·IΔn
  @Test
  void residualBandHasTheStandardBreakTimes() {
    TimeCurrentBand band = TimeCurrentBand.residual(30);
    assertThat(at(band.points(), 1).maxSeconds()).isCloseTo(0.300, within(1e-12));
    assertThat(at(band.points(), 2).maxSeconds()).isCloseTo(0.150, within(1e-12));
    assertThat(at(band.points(), 5).maxSeconds()).isCloseTo(0.040, within(1e-12));
    assertThat(at(band.points(), 5).currentAmps()).isCloseTo(150, within(1e-9));
  }
}
