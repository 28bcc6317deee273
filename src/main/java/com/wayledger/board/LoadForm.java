package com.wayledger.board;

import com.wayledger.engine.LoadCategory;
import com.wayledger.engine.RatingUnit;
import com.wayledger.system.CleanText;
import com.wayledger.system.TextInput.Kind;
import jakarta.validation.constraints.DecimalMax;
import jakarta.validation.constraints.DecimalMin;
import jakarta.validation.constraints.Max;
import jakarta.validation.constraints.Min;
import jakarta.validation.constraints.NotBlank;
import jakarta.validation.constraints.NotNull;
import jakarta.validation.constraints.Positive;
import jakarta.validation.constraints.Size;

/** One load line as typed by a user. */
public record LoadForm(
    @NotBlank @Size(max = 120) @CleanText(Kind.NAME) String description,
    @NotNull LoadCategory category,
    @NotNull @Min(1) @Max(10000) Integer quantity,
    @NotNull @Positive @DecimalMax("10000000") Double ratingValue,
    @NotNull RatingUnit ratingUnit,
    @NotNull @DecimalMin(value = "0", inclusive = false) @DecimalMax("1") Double powerFactor,
    @DecimalMin("1") @DecimalMax("50") Double startUpSurgeMultiple,
    @Positive @DecimalMax("60000") Double startUpSurgeMillis,
    boolean continuous,
    @Positive @DecimalMax("1000") Double motorHorsepower) {

  /** A load with no motor horsepower: the argument list from before motor ratings. */
  public LoadForm(
      String description,
      LoadCategory category,
      Integer quantity,
      Double ratingValue,
      RatingUnit ratingUnit,
      Double powerFactor,
      Double startUpSurgeMultiple,
      Double startUpSurgeMillis,
      boolean continuous) {
    this(
        description,
        category,
        quantity,
        ratingValue,
        ratingUnit,
        powerFactor,
        startUpSurgeMultiple,
        startUpSurgeMillis,
        continuous,
        null);
  }

  public static LoadForm blank() {
    return new LoadForm(
        "", LoadCategory.SOCKET_OUTLETS, 1, null, RatingUnit.W, 1.0, null, null, false);
  }

  public static LoadForm of(LoadItem load) {
    return new LoadForm(
        load.getDescription(),
        load.getCategory(),
        load.getQuantity(),
        load.getRatingValue(),
        load.getRatingUnit(),
        load.getPowerFactor(),
        load.getStartUpSurgeMultiple(),
        load.getStartUpSurgeMillis(),
        load.isContinuous(),
        load.getMotorHorsepower());
  }

  /** The rating as written on a schedule: "2 × 100 W", "16 A"; empty when none. */
  public String ratingLabel() {
    if (ratingValue == null) {
      return "";
    }
    String count = quantity != null && quantity > 1 ? quantity + " × " : "";
    return count
        + Numbers.plain(ratingValue)
        + (ratingUnit == null
            ? ""
            : " " + com.wayledger.system.EnumWords.standard().of(ratingUnit));
  }
}
