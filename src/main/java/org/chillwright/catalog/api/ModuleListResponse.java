package org.chillwright.catalog.api;

import java.util.List;

/** {@code GET /api/v1/modules}: one page of modules and how many matched. */
public record ModuleListResponse(List<ModuleResponse> items, long total, int page, int size) {
}
