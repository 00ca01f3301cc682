package riffle.text;

import java.util.List;
import riffle.model.PiiType;

/**
 * Finds IP addresses (IPv4 dotted quads, IPv6 in full or with {@code ::}) and MAC addresses (six
 * hexadecimal pairs joined by {@code :} or {@code -}, or three groups of four joined by dots).
 * Rules are documented on {@link PiiMasker}. Linear scans, no regular expressions.
 */
final class PiiNetwork {
  /** Words that, just before four dotted numbers, make them a version ("firmware 2.1.0.4"). */
  private static final String[] VERSION_WORDS = {
    "version", "firmware", "fw", "build", "release", "ios", "android", "software"
  };

  private PiiNetwork() {}

  /** Adds IPv4, IPv6 and MAC addresses. */
  static void find(String text, boolean colon, List<PiiSpan> out) {
    int n = text.length();
    for (int i = 0; i < n; i++) {
      char c = text.charAt(i);
      if (!isHex(c)) {
        continue;
      }
      if (i > 0 && isAsciiLetterOrDigit(text.charAt(i - 1)) || PiiChars.isWordCharBefore(text, i)) {
        while (i + 1 < n && isAsciiLetterOrDigit(text.charAt(i + 1))) {
          i++; // the rest of this word
        }
        continue;
      }
      char before = i > 0 ? text.charAt(i - 1) : ' ';
      if (before == '.' || before == ':' || before == '-') {
        continue;
      }
      int e = mac(text, i);
      if (e > 0) {
        out.add(new PiiSpan(PiiType.MAC, i, e));
        i = e - 1;
        continue;
      }
      if (colon) {
        e = ipv6(text, i);
        if (e > 0) {
          out.add(new PiiSpan(PiiType.IP, i, e));
          i = e - 1;
          continue;
        }
      }
      if (c >= '0' && c <= '9') {
        e = ipv4(text, i);
        if (e > 0) {
          out.add(new PiiSpan(PiiType.IP, i, e));
          i = e - 1;
        }
      }
    }
  }

  /** The end of {@code 192.168.1.20} (with an optional {@code :port}) at {@code i}, or -1. */
  static int ipv4(String text, int i) {
    int n = text.length();
    int p = i;
    for (int part = 0; part < 4; part++) {
      if (part > 0) {
        if (p >= n || text.charAt(p) != '.') {
          return -1;
        }
        p++;
      }
      int s = p;
      while (p < n && p - s < 4 && text.charAt(p) >= '0' && text.charAt(p) <= '9') {
        p++;
      }
      int len = p - s;
      if (len == 0 || len > 3 || (len > 1 && text.charAt(s) == '0')) {
        return -1;
      }
      if (Integer.parseInt(text.substring(s, p)) > 255) {
        return -1;
      }
    }
    if (PiiChars.isWordCharAt(text, p)
        || (p + 1 < n && text.charAt(p) == '.' && PiiChars.isDigitAt(text, p + 1))) {
      return -1;
    }
    if (PiiChars.hasWordStartingWith(text, i - 20, i, VERSION_WORDS)) {
      return -1;
    }
    if (p + 1 < n && text.charAt(p) == ':' && PiiChars.isDigitAt(text, p + 1)) {
      int q = p + 1;
      while (q < n && q - p <= 5 && PiiChars.isDigitAt(text, q)) {
        q++;
      }
      if (q - p - 1 <= 5 && !PiiChars.isWordCharAt(text, q)) {
        p = q;
      }
    }
    return p;
  }

  /**
   * The end of an IPv6 address at {@code i}, or -1: eight groups of one to four hexadecimal digits
   * joined by colons, or fewer with one {@code ::}; groups of digits only ("10:30:15") are a time
   * unless there are eight of them or a {@code ::}.
   */
  static int ipv6(String text, int i) {
    int n = text.length();
    int p = i;
    int groups = 0;
    boolean compressed = false;
    boolean letter = false;
    int end = -1;
    while (p < n) {
      int s = p;
      while (p < n && p - s < 5 && isHex(text.charAt(p))) {
        letter |= !(text.charAt(p) >= '0' && text.charAt(p) <= '9');
        p++;
      }
      int len = p - s;
      if (len > 4) {
        return -1;
      }
      if (len > 0) {
        groups++;
        end = p;
      }
      if (p + 1 < n && text.charAt(p) == ':' && text.charAt(p + 1) == ':') {
        if (compressed) {
          return -1;
        }
        compressed = true;
        p += 2;
        end = p;
      } else if (p + 1 < n && text.charAt(p) == ':' && isHex(text.charAt(p + 1)) && len > 0) {
        p++;
      } else {
        break;
      }
    }
    if (end < 0 || PiiChars.isWordCharAt(text, end) || (end < n && text.charAt(end) == ':')) {
      return -1;
    }
    boolean full = groups == 8 && !compressed;
    boolean shortened = compressed && groups >= 2 && groups <= 7 && letter;
    return full || shortened ? end : -1;
  }

  /** The end of a MAC address at {@code i}, or -1. */
  static int mac(String text, int i) {
    int n = text.length();
    if (i + 17 <= n) {
      char sep = text.charAt(i + 2);
      if (sep == ':' || sep == '-') {
        boolean ok = true;
        for (int g = 0; g < 6 && ok; g++) {
          int s = i + g * 3;
          ok =
              isHex(text.charAt(s))
                  && isHex(text.charAt(s + 1))
                  && (g == 5 || text.charAt(s + 2) == sep);
        }
        if (ok
            && !PiiChars.isWordCharAt(text, i + 17)
            && !(i + 17 < n && text.charAt(i + 17) == sep)) {
          return i + 17;
        }
      }
    }
    if (i + 14 <= n && text.charAt(i + 4) == '.' && text.charAt(i + 9) == '.') {
      boolean letter = false;
      for (int k = 0; k < 14; k++) {
        if (k == 4 || k == 9) {
          continue;
        }
        char c = text.charAt(i + k);
        if (!isHex(c)) {
          return -1;
        }
        letter |= !(c >= '0' && c <= '9');
      }
      if (letter
          && !PiiChars.isWordCharAt(text, i + 14)
          && !(i + 14 < n && text.charAt(i + 14) == '.')) {
        return i + 14;
      }
    }
    return -1;
  }

  private static boolean isAsciiLetterOrDigit(char c) {
    return (c >= '0' && c <= '9') || ((c | 0x20) >= 'a' && (c | 0x20) <= 'z');
  }

  private static boolean isHex(char c) {
    return (c >= '0' && c <= '9') || (c >= 'a' && c <= 'f') || (c >= 'A' && c <= 'F');
  }
}
