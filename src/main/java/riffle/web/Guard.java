package riffle.web;

import io.javalin.http.Context;
import io.javalin.http.Cookie;
import io.javalin.http.HandlerType;
import io.javalin.http.HttpStatus;
import io.javalin.http.SameSite;
import java.net.URI;
import java.net.URISyntaxException;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;

/**
 * Checks every request before it is served, and sets the security headers of every response.
 *
 * <ul>
 *   <li>Headers: a Content-Security-Policy that allows only the server's own scripts, styles and
 *       API (no inline script, no other site, no framing), {@code nosniff}, no referrer to other
 *       sites, and {@code no-store} on API answers (they hold personal data).
 *   <li>Host: without an access token, only the server's own loopback names are answered, so that a
 *       web page whose name was rebound to 127.0.0.1 cannot read the project (DNS rebinding).
 *   <li>Token: when one is required (the server listens beyond loopback), every API request must
 *       carry it in the {@value #TOKEN_HEADER} header or the {@value #TOKEN_COOKIE} cookie; the
 *       address printed at start carries it as {@code ?token=}, which sets the cookie.
 *   <li>Origin: a state-changing request (POST, PUT, PATCH, DELETE) must come from the server's own
 *       page: its Origin header (or, lacking one, its Referer) must be the server's origin.
 * </ul>
 *
 * Thread-safe once {@link #bound} has been called.
 */
final class Guard {
  static final String TOKEN_HEADER = "X-Riffle-Token";
  static final String TOKEN_COOKIE = "riffle_token";

  static final String CSP =
      "default-src 'self'; script-src 'self'; style-src 'self'; img-src 'self' data:;"
          + " connect-src 'self'; object-src 'none'; base-uri 'none'; form-action 'self';"
          + " frame-ancestors 'none'";

  private static final Set<HandlerType> CHANGING =
      Set.of(HandlerType.POST, HandlerType.PUT, HandlerType.PATCH, HandlerType.DELETE);

  private final String host;
  private final Optional<String> token;
  private volatile Set<String> ownHosts = Set.of();

  Guard(String host, Optional<String> token) {
    this.host = host;
    this.token = token;
  }

  /** Records the port the server listens on, which completes its own addresses. */
  void bound(int port) {
    String h = host.contains(":") && !host.startsWith("[") ? "[" + host + "]" : host;
    ownHosts =
        isLoopback(host)
            ? Set.of("127.0.0.1:" + port, "localhost:" + port, "[::1]:" + port)
            : Set.of(h.toLowerCase(Locale.ROOT) + ":" + port);
  }

  static boolean isLoopback(String host) {
    String h = host.strip().toLowerCase(Locale.ROOT);
    return h.equals("localhost")
        || h.startsWith("127.")
        || h.equals("::1")
        || h.equals("[::1]")
        || h.equals("0:0:0:0:0:0:0:1");
  }

  /** Runs before every request: headers, host, token and origin checks. */
  void check(Context ctx) {
    ctx.header("Content-Security-Policy", CSP);
    ctx.header("X-Content-Type-Options", "nosniff");
    ctx.header("X-Frame-Options", "DENY");
    ctx.header("Referrer-Policy", "same-origin");
    boolean api = ctx.path().startsWith("/api/") || ctx.path().equals("/api");
    if (api) {
      ctx.header("Cache-Control", "no-store");
    }
    String requestHost =
        Optional.ofNullable(ctx.header("Host")).orElse("").toLowerCase(Locale.ROOT);
    if (token.isEmpty() && !ownHosts.contains(requestHost)) {
      throw new ApiError(
          403,
          "this Riffle server answers only at its own address ("
              + String.join(", ", ownHosts.stream().sorted().toList())
              + "); open it from there");
    }
    if (token.isPresent()) {
      String given = ctx.queryParam("token");
      if (given != null && !api && ctx.method() == HandlerType.GET) {
        if (!matches(given)) {
          throw new ApiError(401, "this access token is not the one the server printed at start");
        }
        Cookie cookie =
            new Cookie(TOKEN_COOKIE, given, "/", -1, false, true, null, SameSite.STRICT);
        cookie.setHttpOnly(true);
        cookie.setPath("/");
        cookie.setSameSite(SameSite.STRICT);
        ctx.cookie(cookie);
        ctx.redirect(ctx.path(), HttpStatus.SEE_OTHER);
        ctx.skipRemainingHandlers();
        return;
      }
      if (api) {
        String carried = ctx.header(TOKEN_HEADER);
        if (carried == null) {
          carried = ctx.cookie(TOKEN_COOKIE);
        }
        if (carried == null || !matches(carried)) {
          throw new ApiError(
              401,
              "this Riffle server needs its access token: open the address it printed at start"
                  + " (the one ending in ?token=…)");
        }
      }
    }
    if (CHANGING.contains(ctx.method())) {
      String origin = ctx.header("Origin");
      if (origin == null) {
        origin = originOf(ctx.header("Referer")).orElse(null);
      }
      String own = "http://" + requestHost;
      if (origin == null || !origin.toLowerCase(Locale.ROOT).equals(own)) {
        throw new ApiError(
            403,
            "changes are accepted only from Riffle's own page at "
                + own
                + "/"
                + (origin == null ? " (the request names no origin)" : ", not from " + origin));
      }
    }
  }

  private boolean matches(String given) {
    return MessageDigest.isEqual(
        token.orElseThrow().getBytes(StandardCharsets.UTF_8),
        given.getBytes(StandardCharsets.UTF_8));
  }

  private static Optional<String> originOf(String referer) {
    if (referer == null) {
      return Optional.empty();
    }
    try {
      URI u = new URI(referer);
      if (u.getScheme() == null || u.getRawAuthority() == null) {
        return Optional.empty();
      }
      return Optional.of(u.getScheme() + "://" + u.getRawAuthority());
    } catch (URISyntaxException e) {
      return Optional.empty();
    }
  }
}
