/**
 * The codebook's rules, saved coding rules and learned suggestions.
 *
 * <p>{@link riffle.coding.Codebook} applies a person's draft to the codebook and checks the result:
 * names present and unique regardless of case, themes two levels deep (a code under a theme cannot
 * have codes of its own), no code its own ancestor, keys unique, one lower-case letter or digit and
 * none of the keys the coding screen moves and undoes with ({@code j}, {@code k}, {@code z}),
 * colours as {@code #rgb} or {@code #rrggbb}. {@link riffle.coding.CodebookFile} reads and writes
 * the codebook as CSV and JSON.
 */
package riffle.coding;
