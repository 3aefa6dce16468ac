package org.chillwright.catalog.web;

import java.io.Serializable;

/** An uploaded CSV kept in the session between its preview and the user's confirmation, which must name {@code previewId}. */
record PendingImport(String previewId, String fileName, String csv) implements Serializable {
}
