package riffle.cli;

/** Command-line entry. */
public final class Main {
  private Main() {}

  public static void main(String[] args) {}
}
