package com.wayledger.site;

import java.util.List;
import org.springframework.data.domain.Page;
import org.springframework.data.domain.Pageable;
import org.springframework.data.jpa.repository.JpaRepository;
import org.springframework.data.jpa.repository.Query;
import org.springframework.data.repository.query.Param;

public interface SiteRepository extends JpaRepository<Site, Long> {

  List<Site> findAllByOrderByNameAsc();

  boolean existsByNameIgnoreCase(String name);

  boolean existsByNameIgnoreCaseAndIdNot(String name, Long id);

  /**
   * Sites whose name or address contains the text, or that hold a board whose reference contains it
   * (all ignoring case), by name; {@code pattern} is the text wrapped in % with % and _ escaped.
   * Native SQL: the board table belongs to the board feature, which builds on this one.
   */
  @Query(
      value =
          "SELECT s.* FROM site s WHERE LOWER(s.name) LIKE :pattern ESCAPE '\\'"
              + " OR LOWER(COALESCE(s.address, '')) LIKE :pattern ESCAPE '\\'"
              + " OR EXISTS (SELECT 1 FROM board b WHERE b.site_id = s.id"
              + " AND LOWER(b.reference) LIKE :pattern ESCAPE '\\')"
              + " ORDER BY s.name",
      countQuery =
          "SELECT COUNT(*) FROM site s WHERE LOWER(s.name) LIKE :pattern ESCAPE '\\'"
              + " OR LOWER(COALESCE(s.address, '')) LIKE :pattern ESCAPE '\\'"
              + " OR EXISTS (SELECT 1 FROM board b WHERE b.site_id = s.id"
              + " AND LOWER(b.reference) LIKE :pattern ESCAPE '\\')",
      nativeQuery = true)
  Page<Site> search(@Param("pattern") String pattern, Pageable page);

  @Query("SELECT s FROM Site s ORDER BY s.name")
  Page<Site> pageByName(Pageable page);
}
