# Build:  ./mvnw -DskipTests package && docker build -t chillwright .
# The jar is extracted (Boot's jarmode tools) and a class-data-sharing archive is made by a training
# run that stops after the context refresh: on the project's 2-core machines this took the first 200
# from about 7 s (java -jar) to about 4 s (docs/benchmarks.md). Not built here: no container engine.
FROM eclipse-temurin:17-jre AS build
WORKDIR /app
COPY target/chillwright-*-SNAPSHOT.jar app.jar
RUN java -Djarmode=tools -jar app.jar extract --destination extracted \
 && cd extracted \
 && java -XX:ArchiveClassesAtExit=app.jsa -Dspring.context.exit=onRefresh \
        -jar app.jar --spring.datasource.url=jdbc:h2:mem:training --chillwright.demo-data.enabled=false

FROM eclipse-temurin:17-jre
RUN useradd --system --uid 10001 chillwright
WORKDIR /app
COPY --from=build /app/extracted/ ./
USER chillwright
EXPOSE 8080
HEALTHCHECK --interval=15s --timeout=5s --start-period=60s --retries=5 \
  CMD wget -qO- http://127.0.0.1:8080/actuator/health/readiness || exit 1
ENTRYPOINT ["java", "-XX:MaxRAMPercentage=70", "-XX:SharedArchiveFile=app.jsa", "-jar", "app.jar"]
