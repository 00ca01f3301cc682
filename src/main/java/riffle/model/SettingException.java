package riffle.model;

/**
 * A setting given to a use case that cannot be used: a wave the project lacks, a limit out of
 * range, a blank column name. It names the setting in plain words ({@code wave}, {@code max size},
 * {@code text column}) and never how a surface takes it: the command line puts its option before
 * the message, the web API names the parameter or field.
 */
public final class SettingException extends InputException {
  private static final long serialVersionUID = 1L;

  private final String setting;

  /**
   * @param setting the setting in plain words, such as {@code wave} or {@code max size}
   * @param message what is wrong with it and what to give instead
   */
  public SettingException(String setting, String message) {
    super(message);
    this.setting = setting;
  }

  /** The setting in plain words, such as {@code wave} or {@code max size}. */
  public String setting() {
    return setting;
  }
}
