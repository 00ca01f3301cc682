/**
 * Web: the JSON API under {@code /api/} and the page in {@code web/}, served by Javalin on
 * 127.0.0.1 unless told otherwise. The front door is {@link riffle.web.WebServer}.
 *
 * <p>Every use of the open project goes through one {@code ProjectAccess}, which runs each piece of
 * work on a single thread (the project is not thread-safe). Requests are guarded by {@code Guard}:
 * security headers on every response, the Host header checked against the server's own addresses,
 * an access token when bound to an address other than loopback, and the Origin of every
 * state-changing request checked against the server's own origin. Failures become JSON {@code
 * {"error": ..., "where": {...}}} in one place ({@code Errors}): bad input is 4xx with a message a
 * person can act on, never 500.
 */
package riffle.web;
