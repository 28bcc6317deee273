package com.wayledger.board;

import java.util.List;
import java.util.Optional;
import org.springframework.data.jpa.repository.JpaRepository;
import org.springframework.data.jpa.repository.Query;
import org.springframework.data.repository.query.Param;

public interface BoardRepository extends JpaRepository<Board, Long> {

  @Query("select b from Board b where b.site.id = :siteId order by b.reference")
  List<Board> findBySite(@Param("siteId") long siteId);

  boolean existsBySiteIdAndReferenceIgnoreCase(long siteId, String reference);

  boolean existsBySiteIdAndReferenceIgnoreCaseAndIdNot(long siteId, String reference, Long id);

  @Query("select b from Board b left join fetch b.circuits where b.id = :id")
  Optional<Board> findWithCircuits(@Param("id") long id);

  @Query("select count(b) from Board b where b.parent.id = :boardId")
  long countChildren(@Param("boardId") long boardId);

  @Query("select b.site.id from Board b where b.id = :id")
  Optional<Long> findSiteIdOf(@Param("id") long id);
}
