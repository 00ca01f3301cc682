package riffle.cli;

import java.lang.annotation.ElementType;
import java.lang.annotation.Retention;
import java.lang.annotation.RetentionPolicy;
import java.lang.annotation.Target;

/** Lets the forbidden-API check accept one use; always say why beside it. */
@Retention(RetentionPolicy.CLASS)
@Target({ElementType.METHOD, ElementType.TYPE})
@interface SuppressForbidden {
  /** Why the forbidden call is right here. */
  String value();
}
