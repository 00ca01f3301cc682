package riffle.cli;

/** Who is running the command, for the audit log. */
final class Actor {
  private Actor() {}

  static String current() {
    String name = System.getProperty("user.name");
    return name == null || name.isBlank() ? "analyst" : name;
  }
}
