/**
 * Component catalogs: the built-in demo catalog (invented, generic units; demo data) and catalogs supplied by the user.
 */
package org.holdover.catalog;
