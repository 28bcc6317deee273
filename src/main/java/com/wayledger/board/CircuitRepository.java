package com.wayledger.board;

import java.util.List;
import org.springframework.data.jpa.repository.JpaRepository;
import org.springframework.data.jpa.repository.Query;
import org.springframework.data.repository.query.Param;

public interface CircuitRepository extends JpaRepository<Circuit, Long> {

  @Query("select max(c.wayNumber) from Circuit c where c.board.id = :boardId")
  Integer highestWay(@Param("boardId") long boardId);

  @Query("select c from Circuit c where c.board.id = :boardId order by c.wayNumber, c.position")
  List<Circuit> findByBoard(@Param("boardId") long boardId);

  /** Way labels ("4", …) of the board's circuits that use a line other than L1. */
  @Query(
      "select concat('', c.wayNumber) from Circuit c where c.board.id = :boardId"
          + " and c.position <> com.wayledger.engine.PhasePosition.L1 order by c.wayNumber")
  List<String> positionsOffL1(@Param("boardId") long boardId);
}
