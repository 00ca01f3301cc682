package riffle.text;

import riffle.model.PiiType;

/** One piece of personal data a detector found: a candidate until overlaps are settled. */
record PiiSpan(PiiType type, int start, int end) {
  int length() {
    return end - start;
  }
}
