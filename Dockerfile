# Build:  ./mvnw -DskipTests package && docker build -t chillwright .
# The jar is unpacked into layers (Boot's jarmode tools) for a faster start than java -jar on a fat jar.
FROM eclipse-temurin:17-jre AS unpack
WORKDIR /work
COPY target/chillwright-*-SNAPSHOT.jar app.jar
RUN java -Djarmode=tools -jar app.jar extract --layers --launcher --destination extracted

FROM eclipse-temurin:17-jre
RUN useradd --system --uid 10001 chillwright
WORKDIR /app
COPY --from=unpack /work/extracted/dependencies/ ./
COPY --from=unpack /work/extracted/spring-boot-loader/ ./
COPY --from=unpack /work/extracted/snapshot-dependencies/ ./
COPY --from=unpack /work/extracted/application/ ./
USER chillwright
EXPOSE 8080
HEALTHCHECK --interval=15s --timeout=5s --start-period=60s --retries=5 \
  CMD wget -qO- http://127.0.0.1:8080/actuator/health/readiness || exit 1
ENTRYPOINT ["java", "-XX:MaxRAMPercentage=70", "org.springframework.boot.loader.launch.JarLauncher"]
