// Exception boundary of the editor: log with spdlog, tell the user, keep running.
#include "guard.h"

#include <QMessageBox>
#include <QPointer>
#include <QTimer>
#include <QWidget>
#include <spdlog/spdlog.h>

namespace lineward::ui {

namespace {

void report(QWidget* parent, const QString& what, const QString& why) {
    spdlog::error("{} failed: {}", what.toStdString(), why.toStdString());
    // Queued: the handler that failed may be inside a paint or a widget's own signal.
    QPointer<QWidget> guard(parent);
    QTimer::singleShot(0, qApp, [guard, what, why] {
        plainMessage(guard.data(), QMessageBox::Warning, QObject::tr("Lineward"),
                     QObject::tr("%1 could not be completed. The drawing is unchanged.\n\n%2")
                         .arg(what, why));
    });
}

} // namespace

void plainMessage(QWidget* parent, QMessageBox::Icon icon, const QString& title,
                  const QString& text) {
    QMessageBox box(icon, title, text, QMessageBox::Ok, parent);
    box.setTextFormat(Qt::PlainText);
    box.exec();
}

bool runGuarded(QWidget* parent, const QString& what, const std::function<void()>& fn) {
    try {
        fn();
        return true;
    } catch (const std::exception& e) {
        report(parent, what, QString::fromUtf8(e.what()));
    } catch (...) {
        report(parent, what, QObject::tr("unknown error"));
    }
    return false;
}

Application::Application(int& argc, char** argv) : QApplication(argc, argv) {}

bool Application::notify(QObject* receiver, QEvent* event) {
    // Every event passes here: no allocation or translation lookup unless something threw.
    try {
        return QApplication::notify(receiver, event);
    } catch (...) {
        runGuarded(nullptr, tr("An action"), [] { throw; });
    }
    return false;
}

} // namespace lineward::ui
