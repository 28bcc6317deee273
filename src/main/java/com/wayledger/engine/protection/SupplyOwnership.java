package com.wayledger.engine.protection;

/**
 * Whether the installation is fed from a public low-voltage network or from a private transformer
 * or generator.
 */
public enum SupplyOwnership {
  /** Public LV distribution network: BS 7671 Appendix 12 limits 3 % lighting, 5 % other. */
  PUBLIC,
  /** Private supply (own transformer or generator): 6 % lighting, 8 % other. */
  PRIVATE
}
