/** Records and enums shared by every stage. Depends on the JDK only. */
package riffle.model;
