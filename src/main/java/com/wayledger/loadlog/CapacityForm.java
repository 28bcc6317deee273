package com.wayledger.loadlog;

import com.wayledger.engine.CircuitLocation;
import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.RatingUnit;
import com.wayledger.engine.capacity.NewLoad;
import com.wayledger.system.CleanText;
import com.wayledger.system.TextInput.Kind;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;

/**
 * The new load as a facility manager describes it on the "can it take it?" form.
 *
 * @param ratingValue kW when {@code ratingUnit} is W, A when it is A
 * @param threePhase true for a three-phase load
 */
public record CapacityForm(
    @NotBlank @Size(max = 120) @CleanText(Kind.NAME) String description,
    @NotNull LoadCategory category,
    @NotNull @Positive @DecimalMax("2000") Double ratingValue,
    @NotNull RatingUnit ratingUnit,
    @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("1") Double powerFactor,
    Boolean threePhase,
    @DecimalMin("1") @DecimalMax("50") Double startUpSurgeMultiple,
    CircuitLocation location) {

  /** A load whose location is not given: the argument list from before locations. */
  public CapacityForm(
      String description,
      LoadCategory category,
      Double ratingValue,
      RatingUnit ratingUnit,
      Double powerFactor,
      Boolean threePhase,
      Double startUpSurgeMultiple) {
    this(
        description,
        category,
        ratingValue,
        ratingUnit,
        powerFactor,
        threePhase,
        startUpSurgeMultiple,
        null);
  }

  public static CapacityForm blank() {
    return new CapacityForm("", LoadCategory.FIXED_APPLIANCE, null, RatingUnit.W, 1.0, false, null);
  }

  NewLoad toNewLoad() {
    return new NewLoad(
        description.strip(),
        category,
        ratingValue,
        ratingUnit == RatingUnit.VA ? RatingUnit.W : ratingUnit,
        powerFactor,
        Boolean.TRUE.equals(threePhase),
        startUpSurgeMultiple,
        location);
  }
}
