package com.wayledger.board;

import java.util.List;
import org.springframework.data.repository.Repository;

/** Append-only: saves and reads, never updates or deletes. */
public interface MeasuredDemandRepository extends Repository<MeasuredDemand, Long> {

  MeasuredDemand save(MeasuredDemand record);

  List<MeasuredDemand> findBySiteIdOrderByPeriodEndDescIdDesc(long siteId);

  List<MeasuredDemand> findByBoardIdOrderByPeriodEndDescIdDesc(long boardId);
}
