package com.wayledger.system;

import org.springframework.web.bind.annotation.ControllerAdvice;
import org.springframework.web.bind.annotation.ModelAttribute;

/** Puts the asset URLs ({@link AssetUrls}) in every page's model as {@code assets}. */
@ControllerAdvice
class AssetLinks {

  private final AssetUrls assets;

  AssetLinks(AssetUrls assets) {
    this.assets = assets;
  }

  @ModelAttribute("assets")
  AssetUrls assets() {
    return assets;
  }
}
