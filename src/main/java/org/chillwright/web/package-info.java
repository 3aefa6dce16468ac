/** Cross-cutting web pieces only: layout, error handling, request logging, the home page. */
package org.chillwright.web;
