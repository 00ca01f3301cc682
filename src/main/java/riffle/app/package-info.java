/**
 * Use cases: the only package that wires the stages and the store together. The command line and
 * the web server call these and nothing below them.
 */
package riffle.app;
