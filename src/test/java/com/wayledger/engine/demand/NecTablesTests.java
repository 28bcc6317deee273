package com.wayledger.engine.demand;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.wayledger.engine.demand.DiversityRule.Tier;
import com.wayledger.engine.demand.DiversityRule.Tiered;
import java.util.List;
import org.junit.jupiter.api.Test;

class NecTablesTests {

  private static final Tiered LIGHTING_TABLE_220_42 =
      new Tiered(List.of(new Tier(3_000.0, 1.0), new Tier(120_000.0, 0.35), new Tier(null, 0.25)));

  @Test
  void lightingTiersOfAnnexExampleD1aGiveFiveThousandOneHundred() {
    // NEC Annex D Example D1(a): 9,000 VA → 3,000 VA at 100 % + 6,000 VA at 35 % = 5,100 VA
    assertThat(LIGHTING_TABLE_220_42.demandVoltAmperes(9_000.0)).isCloseTo(5_100.0, within(1e-6));
  }

  @Test
  void lightingTiersBelowThreeThousandAreTakenWhole() {
    // NEC Table 220.42: first 3,000 VA at 100 %
    assertThat(LIGHTING_TABLE_220_42.demandVoltAmperes(2_500.0)).isCloseTo(2_500.0, within(1e-9));
  }

  @Test
  void lightingTiersAbove120000TakeTwentyFivePercent() {
    // by hand from NEC Table 220.42: 3,000 + 35 % × 117,000 + 25 % × 10,000 = 46,450 VA
    assertThat(LIGHTING_TABLE_220_42.demandVoltAmperes(130_000.0))
        .isCloseTo(46_450.0, within(1e-6));
  }

  @Test
  void oneTwelveKilowattRangeIsEightKilowatts() {
    // NEC Table 220.55 Column C, one range: 8 kW (Annex D Example D1(a))
    assertThat(NecCookingDemand.columnCKilowatts(1, 12.0)).isCloseTo(8.0, within(1e-9));
  }

  @Test
  void oneSixteenKilowattRangeIsRaisedTwentyPercentByNoteOne() {
    // NEC Table 220.55 Note 1: 16 kW exceeds 12 kW by 4 → 8 kW × 1.20 = 9.6 kW
    assertThat(NecCookingDemand.columnCKilowatts(1, 16.0)).isCloseTo(9.6, within(1e-9));
  }

  @Test
  void oneFourteenKilowattRangeIsEightPointEightKilowatts() {
    // worked answer on NEC Table 220.55 Note 1 (sciemce.com): 8 kW × 1.10 = 8.8 kW
    assertThat(NecCookingDemand.columnCKilowatts(1, 14.0)).isCloseTo(8.8, within(1e-9));
  }

  @Test
  void twentyFourSixteenKilowattRangesAreFortySixPointEightKilowatts() {
    // NEC Annex D Example D6 A: 24 ranges → 39 kW; 16 kW → +20 % → 46.8 kW
    assertThat(NecCookingDemand.columnCKilowatts(24, 16.0)).isCloseTo(46.8, within(1e-9));
  }

  @Test
  void thirtyUnequalRangesAverageThirteenPointSixAreFortyNinePointFiveKilowatts() {
    // NEC Annex D Example D6 B: 30 ranges, average 13.6 kW (1.6 kW over → 2 kW) → 45 kW × 1.10 =
    // 49.5 kW
    assertThat(NecCookingDemand.columnCKilowatts(30, 408.0 / 30)).isCloseTo(49.5, within(1e-9));
  }

  @Test
  void tenFourteenKilowattRangesAreTwentySevenPointFiveKilowatts() {
    // EC&M Code Quiz (2023 NEC): Column C 25 kW for ten ranges, +10 % → 27.5 kW
    assertThat(NecCookingDemand.columnCKilowatts(10, 14.0)).isCloseTo(27.5, within(1e-9));
  }

  @Test
  void halfKilowattOverTwelveIsNotAMajorFraction() {
    // NEC Table 220.55 Note 1: "each kilowatt or major fraction thereof"; 0.5 kW is not more than
    // half
    assertThat(NecCookingDemand.columnCKilowatts(1, 12.5)).isCloseTo(8.0, within(1e-9));
  }

  @Test
  void threeMidSizeCookingAppliancesTakeColumnBFiftyFivePercent() {
    // NEC Annex D Example D2(b): two 4 kW ovens + 5.1 kW cooktop = 13.1 kVA, Table 220.55 permits
    // 55 %
    assertThat(NecCookingDemand.columnBFactor(3)).isCloseTo(0.55, within(1e-9));
  }

  @Test
  void nineDryersTakeFiftyFivePercent() {
    // NEC Table 220.54: 9 dryers → 55 %
    assertThat(NecDryerDemand.factor(9)).isCloseTo(0.55, within(1e-9));
  }

  @Test
  void elevenDryersTakeFortySevenPercent() {
    // NEC Table 220.54: 11 dryers → 47 %
    assertThat(NecDryerDemand.factor(11)).isCloseTo(0.47, within(1e-9));
  }

  @Test
  void fifteenDryersTakeFortySevenLessOnePercentForEachAboveEleven() {
    // NEC Table 220.54: 12–23 dryers → 47 % minus 1 % for each dryer exceeding 11; 15 → 43 %
    assertThat(NecDryerDemand.factor(15)).isCloseTo(0.43, within(1e-9));
  }

  @Test
  void fourDryersAreTakenWhole() {
    // NEC Table 220.54 (2023 and earlier): 1–4 dryers → 100 %
    assertThat(NecDryerDemand.factor(4)).isCloseTo(1.0, within(1e-9));
  }

  @Test
  void smallDryerCountsAsFiveThousandVoltAmperes() {
    // NEC 220.54: 5,000 VA or the nameplate rating, whichever is larger
    assertThat(NecDryerDemand.loadPerDryerVoltAmperes(4_000.0)).isCloseTo(5_000.0, within(1e-9));
  }
}
