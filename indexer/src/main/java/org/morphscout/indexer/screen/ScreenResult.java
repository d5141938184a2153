package org.morphscout.indexer.screen;

import java.util.List;
import org.morphscout.indexer.pairing.Verdict;

/**
 * The verdict on one screened row.
 *
 * @param a path of image A as given
 * @param b path of image B as given
 * @param verdict pass, warn or fail (fail when an image could not be read or analysed)
 * @param score 0..100 (0 when the pair could not be scored)
 * @param reasons plain-language findings, or why the row could not be scored
 * @param extras the row's extra columns, unchanged
 */
public record ScreenResult(String a, String b, Verdict verdict, double score, List<String> reasons,
    List<String> extras) {
  public ScreenResult {
    reasons = List.copyOf(reasons);
    extras = List.copyOf(extras);
  }
}
