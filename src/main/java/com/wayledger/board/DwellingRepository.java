package com.wayledger.board;

import java.util.List;
import org.springframework.data.jpa.repository.JpaRepository;
import org.springframework.data.jpa.repository.Query;
import org.springframework.data.repository.query.Param;

public interface DwellingRepository extends JpaRepository<DwellingRecord, Long> {

  @Query(
      "SELECT d FROM DwellingRecord d WHERE d.boardId IN"
          + " (SELECT b.id FROM Board b WHERE b.site.id = :siteId)")
  List<DwellingRecord> findBySite(@Param("siteId") long siteId);
}
