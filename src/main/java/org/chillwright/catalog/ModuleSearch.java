package org.chillwright.catalog;

import jakarta.persistence.criteria.Predicate;
import java.util.ArrayList;
import java.util.Locale;
import org.springframework.data.domain.Sort;
import org.springframework.data.jpa.domain.Specification;

/** Turns a {@link ModuleQuery} into a JPA specification and a sort. */
final class ModuleSearch {

    private ModuleSearch() {
    }

    static Specification<ModuleEntry> matching(ModuleQuery query) {
        return (root, cq, cb) -> {
            var where = new ArrayList<Predicate>();
            if (!query.includeArchived()) {
                where.add(cb.isFalse(root.get("archived")));
            }
            if (query.q() != null) {
                String like = "%" + escapeLike(query.q().toLowerCase(Locale.ROOT)) + "%";
                where.add(cb.or(
                        cb.like(cb.lower(root.get("supplier")), like, '\\'),
                        cb.like(cb.lower(root.get("partNumber")), like, '\\'),
                        cb.like(cb.lower(root.get("description")), like, '\\')));
            }
            if (query.supplier() != null) {
                where.add(cb.equal(root.get("supplier"), query.supplier()));
            }
            if (query.lifecycle() != null) {
                where.add(cb.equal(root.get("lifecycle"), query.lifecycle()));
            }
            range(where, cb, root.get("listImaxA"), query.imaxMinA(), query.imaxMaxA());
            range(where, cb, root.get("listQmaxW"), query.qmaxMinW(), query.qmaxMaxW());
            range(where, cb, root.get("listDtmaxK"), query.dtmaxMinK(), query.dtmaxMaxK());
            return cb.and(where.toArray(Predicate[]::new));
        };
    }

    static Sort sort(ModuleQuery query) {
        Sort.Direction direction = query.descending() ? Sort.Direction.DESC : Sort.Direction.ASC;
        // ties broken by supplier and part number, so paging is stable
        return Sort.by(direction, query.sort().properties()).and(Sort.by("supplier", "partNumber", "id"));
    }

    private static void range(ArrayList<Predicate> where, jakarta.persistence.criteria.CriteriaBuilder cb,
                              jakarta.persistence.criteria.Path<Double> value, Double min, Double max) {
        if (min != null) {
            where.add(cb.greaterThanOrEqualTo(value, min));
        }
        if (max != null) {
            where.add(cb.lessThanOrEqualTo(value, max));
        }
    }

    private static String escapeLike(String text) {
        return text.replace("\\", "\\\\").replace("%", "\\%").replace("_", "\\_");
    }
}
