package com.wayledger.engine.nec;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.CircuitSpec;
import com.wayledger.engine.DeviceKind;
import com.wayledger.engine.DeviceSpec;
import com.wayledger.engine.FaultInterrupter;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.LoadSpec;
import com.wayledger.engine.PhasePosition;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.RcdType;
import com.wayledger.engine.WayStatus;
import com.wayledger.engine.protection.result.Finding;
import com.wayledger.engine.protection.result.Verdict;
import com.wayledger.engine.rules.RuleSets;
import java.util.List;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** GFCI (210.8(A)) and AFCI (210.12(A)) by dwelling location (NFPA 70-2020, from memory). */
class DwellingProtectionTests {

  static CircuitSpec circuit(
      CircuitLocation where, LoadCategory category, double amps, DeviceSpec device) {
    return new CircuitSpec(
        3,
        3,
        PhasePosition.L1,
        "circuit",
        WayStatus.IN_USE,
        false,
        device,
        null,
        List.of(new LoadSpec("load", category, 1, 900, RatingUnit.W, 1.0, null, null, false)),
        null,
        null,
        false,
        where);
  }

  static DeviceSpec breaker(double amps, FaultInterrupter function) {
    return new DeviceSpec(DeviceKind.MCCB, null, amps, 1, 10.0, null, null, function);
  }

  @Test
  void everyGfciLocationOfTheTableNamesItsListItem() {
    // 210.8(A)(1)–(10), NFPA 70-2020 (from memory)
    Map<CircuitLocation, String> expected =
        Map.of(
            CircuitLocation.BATHROOM, "210.8(A)(1)",
            CircuitLocation.GARAGE, "210.8(A)(2)",
            CircuitLocation.OUTDOORS, "210.8(A)(3)",
            CircuitLocation.CRAWL_SPACE, "210.8(A)(4)",
            CircuitLocation.BASEMENT, "210.8(A)(5)",
            CircuitLocation.KITCHEN, "210.8(A)(6)",
            CircuitLocation.NEAR_SINK, "210.8(A)(7)",
            CircuitLocation.BOATHOUSE, "210.8(A)(8)",
            CircuitLocation.NEAR_TUB_OR_SHOWER, "210.8(A)(9)",
            CircuitLocation.LAUNDRY, "210.8(A)(10)");
    expected.forEach(
        (where, clause) ->
            assertThat(DwellingProtection.row(where).gfciClause())
                .as(where.name())
                .startsWith(clause));
  }

  @Test
  void indoorsWithoutARoomIsNotAPassForArcFaultProtection() {
    // 210.12(A) (from memory) ends its list with "or similar rooms or areas": a 120 V 20 A circuit
    // somewhere indoors in a dwelling is most likely covered; "indoors" alone is no pass
    Finding unknownRoom =
        DwellingProtection.arcFault(
            circuit(CircuitLocation.INDOORS, LoadCategory.LIGHTING, 20, breaker(20, null)),
            120.0,
            true);
    assertThat(unknownRoom.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(unknownRoom.summary()).contains("record the room");
    Finding withAfci =
        DwellingProtection.arcFault(
            circuit(
                CircuitLocation.INDOORS,
                LoadCategory.LIGHTING,
                20,
                breaker(20, FaultInterrupter.AFCI)),
            120.0,
            true);
    assertThat(withAfci.verdict()).as(withAfci.summary()).isEqualTo(Verdict.PASS);
    assertThat(withAfci.summary())
        .as("the pass rests on the recorded breaker, not on a room said to need none")
        .contains("arc-fault protection recorded")
        .doesNotContain("not required");
  }

  @Test
  void afciRoomsOf210_12A() {
    // 210.12(A) (from memory): kitchens, family/dining/living rooms and similar, bedrooms,
    // closets, hallways, laundry areas — not bathrooms, garages or outdoors
    for (CircuitLocation where :
        List.of(
            CircuitLocation.KITCHEN,
            CircuitLocation.LIVING_AREA,
            CircuitLocation.BEDROOM,
            CircuitLocation.CLOSET_OR_HALLWAY,
            CircuitLocation.LAUNDRY)) {
      assertThat(DwellingProtection.row(where).afciClause())
          .as(where.name())
          .startsWith("210.12(A)");
    }
    for (CircuitLocation where :
        List.of(CircuitLocation.BATHROOM, CircuitLocation.GARAGE, CircuitLocation.OUTDOORS)) {
      assertThat(DwellingProtection.row(where).afciClause()).as(where.name()).isNull();
    }
  }

  @Test
  void bathroomReceptaclesWithoutGfciAreAWarning() {
    Finding f =
        DwellingProtection.groundFault(
            circuit(CircuitLocation.BATHROOM, LoadCategory.SOCKET_OUTLETS, 20, breaker(20, null)),
            120,
            true);
    assertThat(f.verdict()).isEqualTo(Verdict.WARNING);
    assertThat(f.reference()).contains("210.8(A)(1)");
    Finding fitted =
        DwellingProtection.groundFault(
            circuit(
                CircuitLocation.BATHROOM,
                LoadCategory.SOCKET_OUTLETS,
                20,
                breaker(20, FaultInterrupter.GFCI)),
            120,
            true);
    assertThat(fitted.verdict()).isEqualTo(Verdict.PASS);
  }

  @Test
  void aThirtyMilliampRcboIsNotAGfci() {
    // UL 943 Class A trips at 6 mA at most (from memory); a 30 mA RCD is not one
    DeviceSpec rcbo = new DeviceSpec(DeviceKind.RCBO, null, 20.0, 1, 10.0, 30.0, RcdType.A);
    Finding f =
        DwellingProtection.groundFault(
            circuit(CircuitLocation.BATHROOM, LoadCategory.SOCKET_OUTLETS, 20, rcbo), 120, true);
    assertThat(f.verdict()).isEqualTo(Verdict.WARNING);
    assertThat(f.summary()).contains("not a Class A GFCI");
  }

  @Test
  void bedroomLightingNeedsAfciAndKitchenReceptaclesNeedBoth() {
    Finding bedroom =
        DwellingProtection.arcFault(
            circuit(CircuitLocation.BEDROOM, LoadCategory.LIGHTING, 15, breaker(15, null)),
            120,
            true);
    assertThat(bedroom.verdict()).isEqualTo(Verdict.WARNING);
    assertThat(
            DwellingProtection.needed(
                circuit(
                    CircuitLocation.KITCHEN, LoadCategory.SOCKET_OUTLETS, 20, breaker(20, null)),
                120))
        .isEqualTo(FaultInterrupter.DUAL_FUNCTION);
    Finding dual =
        DwellingProtection.arcFault(
            circuit(
                CircuitLocation.KITCHEN,
                LoadCategory.SOCKET_OUTLETS,
                20,
                breaker(20, FaultInterrupter.DUAL_FUNCTION)),
            120,
            true);
    assertThat(dual.verdict()).isEqualTo(Verdict.PASS);
  }

  @Test
  void afciCoversOnly15And20AmpCircuits() {
    // 210.12(A): 120 V single-phase 15 and 20 A branch circuits
    Finding thirty =
        DwellingProtection.arcFault(
            circuit(CircuitLocation.BEDROOM, LoadCategory.SPACE_HEATING, 30, breaker(30, null)),
            120,
            true);
    assertThat(thirty.verdict()).isEqualTo(Verdict.PASS);
    assertThat(thirty.summary()).startsWith("not required");
  }

  @Test
  void missingLocationOnADwellingCircuitIsNotAssessed() {
    Finding f =
        DwellingProtection.groundFault(
            circuit(null, LoadCategory.SOCKET_OUTLETS, 20, breaker(20, null)), 120, true);
    assertThat(f.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
    assertThat(f.summary()).isEqualTo("not assessed — location not recorded");
    Finding notDwelling =
        DwellingProtection.arcFault(
            circuit(CircuitLocation.BEDROOM, LoadCategory.LIGHTING, 15, breaker(15, null)),
            120,
            false);
    assertThat(notDwelling.verdict()).isEqualTo(Verdict.NOT_ASSESSED);
  }

  @Test
  void eachRuleSetKeepsItsOwnLocations() {
    assertThat(RuleSets.IEC.circuitLocations())
        .contains(CircuitLocation.BATH_OR_SHOWER, CircuitLocation.SAUNA, CircuitLocation.OUTDOORS)
        .doesNotContain(CircuitLocation.KITCHEN, CircuitLocation.BEDROOM);
    assertThat(RuleSets.NEC.circuitLocations())
        .contains(CircuitLocation.KITCHEN, CircuitLocation.OUTDOORS, CircuitLocation.INDOORS)
        .doesNotContain(CircuitLocation.SAUNA, CircuitLocation.BATH_OR_SHOWER);
  }
}
