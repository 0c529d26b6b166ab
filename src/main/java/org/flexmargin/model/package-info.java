/**
 * Input records of an analysis: configurations, structure (mode tables or built-in validation
 * structures), aerodynamic data, the sweep plan and analysis options.
 *
 * <p>Every record is immutable and validated in its compact constructor; arrays are copied in and
 * out. Quantities are SI: metres, kilograms, seconds, radians, pascals. The unit of every numeric
 * component is given in its Javadoc and, where two units are common, in its name. This package
 * depends on nothing else in flexmargin.
 */
package org.flexmargin.model;
