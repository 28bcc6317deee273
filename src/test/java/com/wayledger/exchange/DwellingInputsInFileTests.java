package com.wayledger.exchange;

import static org.assertj.core.api.Assertions.assertThat;

import com.wayledger.engine.dwelling.DwellingAddition;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The dwelling inputs of our workbook's "Dwelling load" sheet, as label → cell text (invented). */
class DwellingInputsInFileTests {

  @Test
  void inputsAsTheSheetWritesThemAreRead() {
    DwellingInputsInFile read =
        DwellingInputsInFile.of(
            "APT-1",
            Map.of(
                DwellingInputsInFile.FLOOR_AREA, "1150",
                DwellingInputsInFile.SMALL_APPLIANCE, "2",
                DwellingInputsInFile.LAUNDRY, "1",
                DwellingInputsInFile.OPTIONAL, "yes",
                DwellingInputsInFile.ADDITION, "NONE"));

    assertThat(read.isValid()).isTrue();
    assertThat(read.form().floorAreaSquareFeetValue()).isEqualTo(1150.0);
    assertThat(read.form().smallApplianceCircuits()).isEqualTo(2);
    assertThat(read.form().laundryCircuits()).isEqualTo(1);
    assertThat(read.form().optionalMethodChosen()).isTrue();
    assertThat(read.form().addition()).isEqualTo(DwellingAddition.NONE);
  }

  @Test
  void notRecordedStaysUnknownNeverZero() {
    DwellingInputsInFile read =
        DwellingInputsInFile.of("APT-2", Map.of(DwellingInputsInFile.FLOOR_AREA, "not recorded"));

    assertThat(read.isValid()).isTrue();
    assertThat(read.form().floorArea()).isNull();
    assertThat(read.form().smallApplianceCircuits()).isNull();
  }

  @Test
  void badValuesAreRefusedEachOnItsOwnLabel() {
    DwellingInputsInFile read =
        DwellingInputsInFile.of(
            "APT-3",
            Map.of(
                DwellingInputsInFile.FLOOR_AREA, "-40",
                DwellingInputsInFile.SMALL_APPLIANCE, "2.5",
                DwellingInputsInFile.LAUNDRY, "many",
                DwellingInputsInFile.OPTIONAL, "perhaps",
                DwellingInputsInFile.ADDITION, "SOMETIMES"));

    assertThat(read.isValid()).isFalse();
    assertThat(read.form()).as("nothing to store").isNull();
    assertThat(read.problems())
        .extracting(DwellingInputsInFile.Problem::label)
        .containsExactlyInAnyOrder(
            DwellingInputsInFile.FLOOR_AREA,
            DwellingInputsInFile.SMALL_APPLIANCE,
            DwellingInputsInFile.LAUNDRY,
            DwellingInputsInFile.OPTIONAL,
            DwellingInputsInFile.ADDITION);
  }
}
