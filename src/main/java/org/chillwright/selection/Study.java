package org.chillwright.selection;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;
import java.time.Instant;

@Entity
@Table(name = "selection_study")
class Study {

    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    private Long id;

    @Column(nullable = false, length = 120)
    private String name;

    @Column(length = 2000)
    private String description;

    @Column(name = "case_query", nullable = false, length = 4000)
    private String caseQuery;

    @Column(name = "catalog_revision", nullable = false)
    private long catalogRevision;

    @Column(name = "ranking_json", nullable = false, length = 1_000_000)
    private String rankingJson;

    @Column(name = "created_by", nullable = false, length = 64)
    private String createdBy;

    @Column(name = "created_at", nullable = false)
    private Instant createdAt;

    @Column(name = "ranked_at", nullable = false)
    private Instant rankedAt;

    @Version
    private long version;

    protected Study() {
    }

    Study(String name, String description, String caseQuery, long catalogRevision, String rankingJson,
          String createdBy, Instant at) {
        this.name = name;
        this.description = description;
        this.caseQuery = caseQuery;
        this.catalogRevision = catalogRevision;
        this.rankingJson = rankingJson;
        this.createdBy = createdBy;
        this.createdAt = at;
        this.rankedAt = at;
    }

    void reranked(long catalogRevision, String rankingJson, Instant at) {
        this.catalogRevision = catalogRevision;
        this.rankingJson = rankingJson;
        this.rankedAt = at;
    }

    Long getId() {
        return id;
    }

    String getName() {
        return name;
    }

    String getDescription() {
        return description;
    }

    String getCaseQuery() {
        return caseQuery;
    }

    long getCatalogRevision() {
        return catalogRevision;
    }

    String getRankingJson() {
        return rankingJson;
    }

    String getCreatedBy() {
        return createdBy;
    }

    Instant getCreatedAt() {
        return createdAt;
    }

    Instant getRankedAt() {
        return rankedAt;
    }

    long getVersion() {
        return version;
    }
}
