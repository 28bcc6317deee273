# Wayledger as a container: build the Spring Boot jar with the Maven wrapper, run it on a Temurin 17 JRE.
# docker compose (docker-compose.yml) builds this for its two app replicas.

FROM eclipse-temurin:17-jdk AS build
WORKDIR /build
COPY mvnw pom.xml ./
COPY .mvn .mvn
COPY db db
COPY src src
RUN ./mvnw -B package -DskipTests -Djacoco.skip=true

FROM eclipse-temurin:17-jre
RUN useradd --system --create-home --home-dir /app wayledger
WORKDIR /app
COPY --from=build /build/target/wayledger-*.jar /app/wayledger.jar
USER wayledger
EXPOSE 8080
ENV JAVA_TOOL_OPTIONS="-XX:MaxRAMPercentage=75"
ENTRYPOINT ["java", "-jar", "/app/wayledger.jar"]
