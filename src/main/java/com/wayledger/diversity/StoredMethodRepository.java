package com.wayledger.diversity;

import org.springframework.data.jpa.repository.JpaRepository;

public interface StoredMethodRepository extends JpaRepository<StoredMethod, String> {}
