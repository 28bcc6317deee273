package com.wayledger.loadlog;

/**
 * What checking a site's change-log chain found. When the chain is intact, {@code brokenAt…} and
 * {@code problem} are null and {@code headHash} is the last entry's hash: noting it somewhere else
 * (a report, a ticket) lets a later check also notice entries removed from the end, which a chain
 * alone cannot show.
 *
 * @param entriesChecked entries read, in chain order, up to and including the first break
 * @param brokenAtEntryId id of the first entry where the chain breaks
 * @param brokenAtSequence its place in the site's chain (1 for the first entry)
 * @param problem what is wrong there: {@link Problem}
 */
public record LogVerification(
    long siteId,
    long entriesChecked,
    boolean intact,
    Long brokenAtEntryId,
    Long brokenAtSequence,
    Problem problem,
    String headHash) {

  /** The ways a chain can break. */
  public enum Problem {
    /** The entry has no place or hash in the chain (written around the database's trigger). */
    UNCHAINED,
    /** An entry is missing before this one (removed), or two share a place. */
    GAP,
    /** This entry does not point at the hash of the entry before it (inserted or reordered). */
    LINK,
    /** This entry's fields no longer give its hash (changed after it was written). */
    ALTERED
  }
}
