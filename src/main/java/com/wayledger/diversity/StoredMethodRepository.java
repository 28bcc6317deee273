package com.wayledger.diversity;

import org.springframework.data.jpa.repository.JpaRepository;

interface StoredMethodRepository extends JpaRepository<StoredMethod, String> {}
