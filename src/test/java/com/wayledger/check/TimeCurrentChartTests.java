package com.wayledger.check;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.TripCurve;
import com.wayledger.engine.protection.device.DeviceCharacteristic;
import com.wayledger.engine.protection.device.TimeCurrentBand;
import org.junit.jupiter.api.Test;

class TimeCurrentChartTests {

  private final TimeCurrentBand b16 =
      TimeCurrentBand.of(DeviceCharacteristic.miniature(DeviceKind.MCB, TripCurve.B, 16.0, null));

  @Test
  void markersLieLeftToRightInOrderOfCurrentOnTheLogAxis() {
    TimeCurrentChart chart = TimeCurrentChart.of(b16, 16.0, 10.0, 73.0, 0.15, 412.0);
    assertThat(chart.markers())
        .extracting(TimeCurrentChart.Marker::kind)
        .containsExactly("design", "surge", "fault");
    assertThat(chart.markers().get(0).x()).isLessThan(chart.markers().get(1).x());
    assertThat(chart.markers().get(1).x()).isLessThan(chart.markers().get(2).x());
    // log scale: equal ratios of current give equal distances (10 → 100 A is one decade, as is 100
    // → 1000 A)
    double decade = chart.currentTicks().get(1).position() - chart.currentTicks().get(0).position();
    double tenToHundred =
        TimeCurrentChart.of(b16, 16.0, 10.0, 100.0, null, null).markers().get(1).x()
            - TimeCurrentChart.of(b16, 16.0, 10.0, 100.0, null, null).markers().get(0).x();
    assertThat(tenToHundred).isCloseTo(decade, org.assertj.core.api.Assertions.within(0.01));
  }

  @Test
  void bandIsAClosedPathInsideThePlotAndTheSurgeIsAPointAtItsDuration() {
    TimeCurrentChart chart = TimeCurrentChart.of(b16, 16.0, 10.0, 73.0, 0.15, 412.0);
    assertThat(chart.bandPath()).startsWith("M ").endsWith(" Z");
    for (String number : chart.bandPath().replaceAll("[MLZ]", " ").trim().split("\\s+")) {
      double value = Double.parseDouble(number);
      assertThat(value).isBetween(0.0, (double) TimeCurrentChart.WIDTH);
    }
    assertThat(chart.surgePoint()).isNotNull();
    assertThat(chart.surgePoint().label()).isEqualTo("73 A for 150 ms");
  }

  @Test
  void aDeviceWithoutABandDrawsOnlyTheMarkers() {
    TimeCurrentChart chart = TimeCurrentChart.of(null, 32.0, 20.0, null, null, null);
    assertThat(chart.bandPath()).isEmpty();
    assertThat(chart.markers()).hasSize(1);
  }

  @org.junit.jupiter.api.Test
  void aSmallDesignCurrentReadsWithItsDecimalNotAsZeroAmps() {
    // wording slip: "Ib 0 A" on the chart for a circuit carrying 0.47 A
    TimeCurrentChart.Marker marker = new TimeCurrentChart.Marker("design", "Ib", 0.47, 100);
    org.assertj.core.api.Assertions.assertThat(marker.text()).isEqualTo("Ib 0.5 A");
    org.assertj.core.api.Assertions.assertThat(
            new TimeCurrentChart.Marker("fault", "fault", 1234.0, 100).text())
        .isEqualTo("fault 1234 A");
  }

  @org.junit.jupiter.api.Test
  void aMarkerNearTheRightEdgeIsLabelledOnItsLeftSoTheLabelIsNotCutOff() {
    org.assertj.core.api.Assertions.assertThat(
            new TimeCurrentChart.Marker("fault", "fault", 5000, TimeCurrentChart.RIGHT - 10)
                .labelOnLeft())
        .isTrue();
    org.assertj.core.api.Assertions.assertThat(
            new TimeCurrentChart.Marker("design", "Ib", 5, 120).labelOnLeft())
        .isFalse();
  }
}
