package riffle.web;

import com.fasterxml.jackson.core.JsonProcessingException;
import java.nio.ByteBuffer;
import java.util.Map;
import org.eclipse.jetty.http.HttpHeader;
import org.eclipse.jetty.server.Request;
import org.eclipse.jetty.server.Response;
import org.eclipse.jetty.server.handler.ErrorHandler;
import org.eclipse.jetty.util.Callback;

/**
 * Jetty's own error answers — for requests refused before Javalin sees them, such as an address
 * that cannot be decoded — in the API's shape, {@code {"error", "where"}}, with a message of ours
 * for the status. Never Jetty's HTML page, its reason text or an exception. Thread-safe.
 */
final class ErrorPages extends ErrorHandler {
  ErrorPages() {
    setShowStacks(false);
    setShowCauses(false);
    setCacheControl("no-store");
  }

  @Override
  public boolean errorPageForMethod(String method) {
    return true;
  }

  @Override
  protected void generateResponse(
      Request request,
      Response response,
      int code,
      String message,
      Throwable cause,
      Callback callback) {
    byte[] body;
    try {
      body = ApiJson.MAPPER.writeValueAsBytes(Errors.body(Errors.forStatus(code), Map.of()));
    } catch (JsonProcessingException e) {
      callback.failed(e);
      return;
    }
    response.getHeaders().put(HttpHeader.CONTENT_TYPE, "application/json;charset=utf-8");
    response.getHeaders().put("X-Content-Type-Options", "nosniff");
    response.write(true, ByteBuffer.wrap(body), callback);
  }
}
