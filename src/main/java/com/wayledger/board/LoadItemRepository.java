package com.wayledger.board;

import org.springframework.data.jpa.repository.JpaRepository;

public interface LoadItemRepository extends JpaRepository<LoadItem, Long> {}
