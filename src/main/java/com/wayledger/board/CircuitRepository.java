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
}
